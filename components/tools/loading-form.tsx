"use client";
import { PendingButton } from "@/components/bookings/pending-button";
import { useKeptForm } from "@/components/bookings/use-kept-form";
import { FormMessage } from "@/components/ui/form-message";
import { initialActionState } from "@/lib/actions/action-state";
import { saveLoading } from "@/lib/actions/tools/save-loading";
import { LoadingFields } from "./loading-fields";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

type Props = Omit<Parameters<typeof LoadingFields>[0], "errors"> & { slug: string; bookingId: string };

export function LoadingForm({ slug, bookingId, ...fields }: Props) {
  const { state, onSubmit, pending } = useKeptForm(saveLoading, initialActionState);
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Weight and balance">
      <IdempotencyKeyField answer={state} />
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bookingId" value={bookingId} />
      <LoadingFields {...fields} errors={state.fieldErrors} />
      <PendingButton pending={pending} pendingText="Working it out…">Work out and save</PendingButton>
    </form>
  );
}
