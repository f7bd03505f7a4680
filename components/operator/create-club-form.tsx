"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import Link from "next/link";
import { Field, SelectField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { createClub } from "@/lib/actions/operator/create-club";
import { CURRENCIES } from "@/lib/validation/clubs";

const ZONES = ["America/New_York", "America/Chicago", "America/Denver", "America/Phoenix", "America/Los_Angeles", "America/Anchorage", "Pacific/Honolulu", "Europe/London", "Europe/Berlin", "Europe/Paris", "Europe/Madrid", "Australia/Sydney", "Pacific/Auckland", "UTC"];

export function CreateClubForm() {
  const form = useFormAction(createClub);
  const { state } = form;
  const f = state.fieldErrors;
  return (
    <FormShell form={form} label="Create a club">
      {state.ok && state.data ? <p className="mb-4"><Link href={`/clubs/${state.data.slug}`}>Open the new club</Link> (you see it once you hold a role in it)</p> : null}
      <Field label="Club name" name="name" required errors={f.name} />
      <Field label="Web address" name="slug" required hint="Lower-case letters, digits and hyphens; appears in /clubs/…" errors={f.slug} />
      <SelectField label="Time zone" name="timeZone" defaultValue="America/Chicago" errors={f.timeZone}>
        {ZONES.map((z) => <option key={z} value={z}>{z}</option>)}
      </SelectField>
      <SelectField label="Currency" name="currency" defaultValue="USD" errors={f.currency}>
        {CURRENCIES.map((c) => <option key={c} value={c}>{c}</option>)}
      </SelectField>
      <SelectField label="Units" name="unitSystem" defaultValue="imperial" errors={f.unitSystem}>
        <option value="imperial">US: gallons, pounds, inches</option>
        <option value="metric">Metric: litres, kilograms, millimetres</option>
      </SelectField>
      <Field label="First admin's e-mail" name="adminEmail" type="email" required hint="They get an invitation if they have no account yet." errors={f.adminEmail} />
      <SubmitButton pendingText="Creating…">Create club</SubmitButton>
    </FormShell>
  );
}
