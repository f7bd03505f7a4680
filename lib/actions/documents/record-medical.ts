"use server";
import { medicalCertificates } from "@/db/schema";
import { getOwnBirthDate, saveOwnBirthDate } from "@/db/queries/safety-documents";
import { clubAction } from "@/lib/actions/create-action";
import { ActionError } from "@/lib/actions/action-state";
import { clubToday } from "@/lib/actions/safety/bulletin-publishing";
import { basicMedStatus, medicalExpiry } from "@/lib/currency";
import { compareIsoDates } from "@/lib/dates";
import { writeAudit } from "@/lib/server/audit";
import { canOn } from "@/permissions";
import { recordMedicalSchema } from "@/lib/validation/safety";

/**
 * A member records their own medical. The expiry is computed here (14 CFR 61.23(d) needs the
 * age on the exam date) and stored, so others can be shown the date without the birth date,
 * which stays on the member's private record. The audit row carries the expiry only.
 */
export const recordMedical = clubAction({
  schema: recordMedicalSchema,
  permission: (ability, _input, ctx) => canOn(ability, "update", "Medical", { userId: ctx.user.id }),
  success: "Medical recorded.",
  run(tx, ctx, input) {
    const { club, user } = ctx;
    const today = clubToday(ctx);
    if (compareIsoDates(input.examDate, today) > 0) throw new ActionError("Some fields need attention; nothing was saved.", { examDate: ["The exam date cannot be in the future."] });
    if (input.courseDate && compareIsoDates(input.courseDate, today) > 0) throw new ActionError("Some fields need attention; nothing was saved.", { courseDate: ["The course date cannot be in the future."] });
    let expiresOn: string;
    if (input.kind === "faa_class") {
      const birthDate = input.birthDate ?? getOwnBirthDate(tx, club.id, user.id);
      if (!birthDate) {
        throw new ActionError("Some fields need attention; nothing was saved.", { birthDate: ["Enter your date of birth: how long a medical lasts depends on your age on the exam date. Only you will see it."] });
      }
      if (compareIsoDates(birthDate, input.examDate) >= 0) throw new ActionError("Some fields need attention; nothing was saved.", { birthDate: ["The date of birth must be before the exam date."] });
      if (input.birthDate) saveOwnBirthDate(tx, club.id, user.id, input.birthDate);
      expiresOn = medicalExpiry({ medicalClass: input.medicalClass as 1 | 2 | 3, examDate: input.examDate, birthDate });
    } else {
      if (input.birthDate) saveOwnBirthDate(tx, club.id, user.id, input.birthDate);
      expiresOn = basicMedStatus({ courseDate: input.courseDate!, examDate: input.examDate }, today).lastDay;
    }
    const [row] = tx
      .insert(medicalCertificates)
      .values({
        clubId: club.id,
        userId: user.id,
        kind: input.kind,
        medicalClass: input.kind === "faa_class" ? (input.medicalClass ?? null) : null,
        examDate: input.examDate,
        courseDate: input.kind === "basicmed" ? (input.courseDate ?? null) : null,
        limitations: input.limitations ?? null,
        expiresOn,
        recordedById: user.id,
      })
      .returning({ id: medicalCertificates.id })
      .all();
    writeAudit(tx, { clubId: club.id, actorId: user.id, action: "medical.record", subjectType: "Medical", subjectId: row!.id, after: { expiresOn } });
    return { message: `Medical recorded: valid for private-pilot privileges through ${expiresOn}.`, refresh: true };
  },
});
