"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Field } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { updateHomePosition } from "@/lib/actions/clubs/update-home-position";

export function HomePositionForm({ slug, latitude, longitude }: { slug: string; latitude: number | null; longitude: number | null }) {
  const form = useFormAction(updateHomePosition, { keepValuesAfterOk: true });
  const { state } = form;
  const e = state.fieldErrors;
  return (
    <FormShell form={form} label="Home field position">
      <input type="hidden" name="club" value={slug} />
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field label="Latitude (decimal degrees, north positive)" name="homeLatitude" inputMode="decimal" defaultValue={latitude?.toString() ?? ""} errors={e.homeLatitude} />
        <Field label="Longitude (decimal degrees, east positive)" name="homeLongitude" inputMode="decimal" defaultValue={longitude?.toString() ?? ""} errors={e.homeLongitude} />
      </div>
      <SubmitButton variant="secondary" pendingText="Saving…">Save position</SubmitButton>
    </FormShell>
  );
}
