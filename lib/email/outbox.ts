import type { Db, Tx } from "@/db/client";
import { emailOutbox } from "@/db/schema";
import type { EmailTemplateName, EmailTemplates } from "@/emails";

export type EnqueueInput<K extends EmailTemplateName> = {
  clubId: string | null;
  to: string;
  subject: string;
  template: K;
  payload: EmailTemplates[K];
  /** Compose the row at this instant instead of now (a scheduled batch is stamped with its batch time). */
  at?: Date;
};

function stamps(at: Date | undefined) {
  return at ? { createdAt: at, updatedAt: at, nextAttemptAt: at } : {};
}

/** Writes the message as a row inside the caller's transaction; the worker sends it later. */
export function enqueueEmail<K extends EmailTemplateName>(tx: Tx | Db, input: EnqueueInput<K>): string {
  const [row] = tx
    .insert(emailOutbox)
    .values({
      clubId: input.clubId,
      toAddress: input.to.trim().toLowerCase(),
      subject: input.subject,
      template: input.template,
      payload: input.payload as Record<string, unknown>,
      ...stamps(input.at),
    })
    .returning({ id: emailOutbox.id })
    .all();
  if (!row) throw new Error("Outbox insert returned no row");
  return row.id;
}

export function enqueueEmails<K extends EmailTemplateName>(tx: Tx | Db, inputs: EnqueueInput<K>[]): number {
  if (inputs.length === 0) return 0;
  const rows = inputs.map((input) => ({
    clubId: input.clubId,
    toAddress: input.to.trim().toLowerCase(),
    subject: input.subject,
    template: input.template,
    payload: input.payload as Record<string, unknown>,
    ...stamps(input.at),
  }));
  // SQLite limits bound parameters per statement; insert in slices.
  for (let i = 0; i < rows.length; i += 200) tx.insert(emailOutbox).values(rows.slice(i, i + 200)).run();
  return rows.length;
}
