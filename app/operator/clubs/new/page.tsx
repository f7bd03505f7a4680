import { notFound, redirect } from "next/navigation";
import { CreateClubForm } from "@/components/operator/create-club-form";
import { PageHeader } from "@/components/ui/page-header";
import { getSessionUser } from "@/lib/server/session";

export default async function NewClubPage() {
  const user = await getSessionUser();
  if (!user) redirect("/sign-in?callbackUrl=/operator/clubs/new");
  if (user.platformRole !== "operator") notFound();
  return (
    <div className="max-w-xl">
      <PageHeader title="Create a club" lead="The club starts with default settings. Its admin is invited by e-mail and takes over on accepting; you cannot name yourself." />
      <div className="card"><CreateClubForm /></div>
    </div>
  );
}
