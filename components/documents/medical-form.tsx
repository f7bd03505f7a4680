"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { useState } from "react";
import { Field, SelectField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { recordMedical } from "@/lib/actions/documents/record-medical";

export function MedicalForm({ slug, today, hasBirthDate }: { slug: string; today: string; hasBirthDate: boolean }) {
  const form = useFormAction(recordMedical);
  const { state } = form;
  const [kind, setKind] = useState<"faa_class" | "basicmed">("faa_class");
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Record a medical">
      <input type="hidden" name="club" value={slug} />
      <div className="grid gap-x-4 sm:grid-cols-2">
        <SelectField label="Kind" name="kind" value={kind} onChange={(ev) => setKind(ev.target.value as "faa_class" | "basicmed")} errors={e.kind}>
          <option value="faa_class">Medical certificate</option>
          <option value="basicmed">BasicMed</option>
        </SelectField>
        {kind === "faa_class" ? (
          <SelectField label="Class" name="medicalClass" defaultValue="3" errors={e.medicalClass}>
            <option value="1">First class</option>
            <option value="2">Second class</option>
            <option value="3">Third class</option>
          </SelectField>
        ) : (
          <Field label="BasicMed course completed on" name="courseDate" type="date" max={today} errors={e.courseDate} />
        )}
        <Field label={kind === "faa_class" ? "Exam date" : "Physical exam date"} name="examDate" type="date" max={today} errors={e.examDate} />
        <Field
          label={hasBirthDate ? "Date of birth (already on file; change only if wrong)" : "Date of birth"}
          name="birthDate"
          type="date"
          max={today}
          autoComplete="bday"
          errors={e.birthDate}
          hint="Private: only you see it. It sets how long the medical lasts (age on the exam date)."
        />
      </div>
      <Field label="Limitations (optional)" name="limitations" maxLength={500} errors={e.limitations} hint="Seen only by you and club admins." />
      <SubmitButton>Record medical</SubmitButton>
    </FormShell>
  );
}
