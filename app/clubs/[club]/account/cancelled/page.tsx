import type { Metadata } from "next";
import Link from "next/link";
import { PageHeader } from "@/components/ui/page-header";
import { authorizePage, ownRecord } from "@/lib/server/authorize";

export const metadata: Metadata = { title: "Payment cancelled" };

export default async function CancelledPage({ params }: { params: Promise<{ club: string }> }) {
  const { club: slug } = await params;
  const { club } = await authorizePage(slug, ownRecord("read", "Account"));
  return (
    <div className="max-w-2xl">
      <PageHeader title="No payment was made" />
      <section className="card">
        <p>You left the payment page before paying, so nothing was charged and your balance is as it was.</p>
        <p className="mt-4"><Link href={`/clubs/${club.slug}/account`}>Back to my account</Link></p>
      </section>
    </div>
  );
}
