"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SelectField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { updateClubLocale } from "@/lib/actions/clubs/update-club-locale";

export function ClubLocaleForm({ slug, locale, options }: { slug: string; locale: string; options: { tag: string; name: string; sample: string }[] }) {
  const form = useFormAction(updateClubLocale, { keepValuesAfterOk: true });
  const e = form.state.fieldErrors;
  return (
    <FormShell form={form} label="Club locale">
      <input type="hidden" name="club" value={slug} />
      <SelectField label="Locale" name="locale" defaultValue={locale} errors={e.locale} hint="Money, numbers and dates on every page, statement, PDF and e-mail follow it.">
        {options.map((o) => (
          <option key={o.tag} value={o.tag}>{`${o.name} — ${o.sample}`}</option>
        ))}
      </SelectField>
      <SubmitButton variant="secondary" pendingText="Saving…">Save locale</SubmitButton>
    </FormShell>
  );
}
