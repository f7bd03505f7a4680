"use server";
import { clubAction } from "@/lib/actions/create-action";
import { kickOutbox } from "@/lib/email/runner";
import { issueStatements } from "@/db/queries/money-statements";
import { writeAudit } from "@/lib/server/audit";
import { emailStatementSchema } from "@/lib/validation/money";
import { canOn } from "@/permissions";
import { ledger } from "./ledger-errors";

export const emailStatement = clubAction({
  schema: emailStatementSchema,
  permission: (ability, input) => canOn(ability, "read", "Account", { userId: input.memberUserId }),
  success: "The statement is on its way by e-mail.",
  run(tx, ctx, input) {
    ledger(() => issueStatements(tx, ctx.club.id, { month: input.month, memberUserIds: [input.memberUserId], force: true }));
    writeAudit(tx, { clubId: ctx.club.id, actorId: ctx.user.id, action: "money.statement.email", subjectType: "Statement", subjectId: `${input.memberUserId}:${input.month}` });
  },
  after: () => kickOutbox(),
});
