"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { saveLoading } from "@/lib/actions/tools/save-loading";
import { LoadingFields } from "./loading-fields";

type Props = Omit<Parameters<typeof LoadingFields>[0], "errors"> & { slug: string; bookingId: string };

export function LoadingForm({ slug, bookingId, ...fields }: Props) {
  const form = useFormAction(saveLoading);
  const { state } = form;
  return (
    <FormShell form={form} label="Weight and balance">
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bookingId" value={bookingId} />
      <LoadingFields {...fields} errors={state.fieldErrors} />
      <SubmitButton pendingText="Working it out…">Work out and save</SubmitButton>
    </FormShell>
  );
}
