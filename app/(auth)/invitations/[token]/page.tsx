import type { Metadata } from "next";
import Link from "next/link";
import { AcceptInvitationForm } from "@/components/auth/accept-invitation-form";
import { getDb } from "@/db/client";
import { findInvitationByToken } from "@/db/queries/invitations";
import { getSessionUser } from "@/lib/server/session";
import { ROLE_LABELS } from "@/permissions";

export const metadata: Metadata = { title: "Club invitation" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invitation = findInvitationByToken(getDb(), token);
  const user = await getSessionUser();
  let body: React.ReactNode;
  if (!invitation || invitation.state !== "open") {
    body = <p className="text-ink-700">This invitation is no longer valid: it was used, withdrawn or has expired. Ask the club for a new one.</p>;
  } else if (invitation.accountExists && user?.email !== invitation.email) {
    body = (
      <p className="text-ink-700">
        An account already uses {invitation.email}.{" "}
        <Link href={`/sign-in?callbackUrl=${encodeURIComponent(`/invitations/${token}`)}`}>Sign in as {invitation.email}</Link> to accept.
      </p>
    );
  } else {
    body = (
      <>
        <p className="mb-4 text-ink-700">
          You are invited to <strong>{invitation.clubName}</strong> as {invitation.roles.map((r) => ROLE_LABELS[r].toLowerCase()).join(", ")}, for {invitation.email}.
        </p>
        <AcceptInvitationForm token={token} needsAccount={!invitation.accountExists} />
      </>
    );
  }
  return (
    <main className="mx-auto max-w-lg p-4 sm:p-8">
      <div className="card">
        <p className="text-sm font-bold uppercase tracking-widest text-fin-600">Hangarline</p>
        <h1 className="mb-3 text-2xl font-bold">Club invitation</h1>
        {body}
      </div>
    </main>
  );
}
