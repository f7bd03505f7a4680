"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { updateFlyingDay } from "@/lib/actions/clubs/update-flying-day";

export function FlyingDayForm({ slug, opens, closes }: { slug: string; opens: string; closes: string }) {
  const form = useFormAction(updateFlyingDay, { keepValuesAfterOk: true });
  const { state } = form;
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Flying day">
      <input type="hidden" name="club" value={slug} />
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field label="Opens (HH:MM, club time)" name="flyingDayOpens" inputMode="numeric" defaultValue={opens} errors={e.flyingDayOpens} />
        <Field label="Closes (HH:MM, club time)" name="flyingDayCloses" inputMode="numeric" defaultValue={closes} errors={e.flyingDayCloses} />
      </div>
      <SubmitButton variant="secondary" pendingText="Saving…">Save flying day</SubmitButton>
    </FormShell>
  );
}
