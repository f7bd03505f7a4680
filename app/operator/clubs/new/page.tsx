import type { Metadata } from "next";
import { CreateClubForm } from "@/components/operator/create-club-form";
import { PageHeader } from "@/components/ui/page-header";
import { authorizeOperatorPage } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "New club · Operator console" };

export default async function NewClubPage() {
  await authorizeOperatorPage();
  return (
    <div className="max-w-xl">
      <PageHeader title="Create a club" lead="The club starts with default settings. Its admin is invited by e-mail and takes over on accepting; you cannot name yourself." />
      <div className="card"><CreateClubForm /></div>
    </div>
  );
}
