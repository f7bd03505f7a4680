"use client";
import { useActionState } from "react";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { updateHomePosition } from "@/lib/actions/clubs/update-home-position";

export function HomePositionForm({ slug, latitude, longitude }: { slug: string; latitude: number | null; longitude: number | null }) {
  const [state, action] = useActionState(updateHomePosition, initialActionState);
  const e = state.fieldErrors;
  return (
    <form action={action} noValidate aria-label="Home field position">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <div className="grid gap-x-3 sm:grid-cols-2">
        <Field label="Latitude (decimal degrees, north positive)" name="homeLatitude" inputMode="decimal" defaultValue={latitude?.toString() ?? ""} errors={e.homeLatitude} />
        <Field label="Longitude (decimal degrees, east positive)" name="homeLongitude" inputMode="decimal" defaultValue={longitude?.toString() ?? ""} errors={e.homeLongitude} />
      </div>
      <SubmitButton variant="secondary" pendingText="Saving…">Save position</SubmitButton>
    </form>
  );
}
