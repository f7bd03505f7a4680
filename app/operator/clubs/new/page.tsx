import { CreateClubForm } from "@/components/operator/create-club-form";
import { PageHeader } from "@/components/ui/page-header";

export default function NewClubPage() {
  return (
    <div className="max-w-xl">
      <PageHeader title="Create a club" lead="The club starts with default settings; its admin adjusts them." />
      <div className="card"><CreateClubForm /></div>
    </div>
  );
}
