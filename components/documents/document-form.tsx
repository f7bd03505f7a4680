"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { useState } from "react";
import { Field, SelectField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { recordDocument } from "@/lib/actions/documents/record-document";
import { DOCUMENT_KINDS, type DocumentKind } from "@/db/schema/safety";
import { DOCUMENT_KIND_LABELS } from "@/lib/safety/labels";

const COPY: Record<DocumentKind, { issued: string; reference: string; details: string; expires: string | null }> = {
  pilot_certificate: { issued: "Date issued", reference: "Certificate number", details: "Certificate level and ratings", expires: null },
  flight_review: { issued: "Date of the review", reference: "Logbook reference (optional)", details: "Instructor who gave it", expires: null },
  renters_insurance: { issued: "Policy start", reference: "Policy number", details: "Insurer and limits", expires: "Policy expires on" },
  club_agreement: { issued: "Date signed", reference: "Agreement version (optional)", details: "Notes (optional)", expires: "Expires on (optional)" },
};

export function DocumentForm({ slug, today }: { slug: string; today: string }) {
  const form = useFormAction(recordDocument);
  const { state } = form;
  const [kind, setKind] = useState<DocumentKind>("pilot_certificate");
  const copy = COPY[kind];
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Record a document">
      <input type="hidden" name="club" value={slug} />
      <SelectField label="Document" name="kind" value={kind} onChange={(ev) => setKind(ev.target.value as DocumentKind)} errors={e.kind}>
        {DOCUMENT_KINDS.map((k) => (
          <option key={k} value={k}>{DOCUMENT_KIND_LABELS[k]}</option>
        ))}
      </SelectField>
      <div className="grid gap-x-4 sm:grid-cols-2">
        <Field label={copy.issued} name="issuedOn" type="date" max={today} errors={e.issuedOn} />
        {copy.expires ? <Field label={copy.expires} name="expiresOn" type="date" errors={e.expiresOn} /> : null}
        <Field label={copy.reference} name="reference" maxLength={80} autoComplete="off" errors={e.reference} />
        <Field label={copy.details} name="details" maxLength={500} errors={e.details} />
      </div>
      {kind === "flight_review" ? <p className="mb-4 text-sm text-ink-700">Expires at the end of the 24th calendar month after the review month (14 CFR 61.56(c)); Hangarline works the date out.</p> : null}
      <Field label="Scan or photo (optional)" name="file" type="file" accept="application/pdf,image/jpeg,image/png,image/webp,image/heic" errors={e.file} hint="PDF or photo, up to 10 MB. Instructors, the safety officer and club admins can open it." />
      <SubmitButton>Record document</SubmitButton>
    </FormShell>
  );
}
