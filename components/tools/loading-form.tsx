"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { saveLoading } from "@/lib/actions/tools/save-loading";
import { LoadingFields } from "./loading-fields";

type Props = Omit<Parameters<typeof LoadingFields>[0], "errors"> & { slug: string; bookingId: string };

export function LoadingForm({ slug, bookingId, ...fields }: Props) {
  const [state, action] = useActionState(saveLoading, initialActionState);
  return (
    <form action={action} noValidate aria-label="Weight and balance">
      <FormMessage state={state} />
      <input type="hidden" name="club" value={slug} />
      <input type="hidden" name="bookingId" value={bookingId} />
      <LoadingFields {...fields} errors={state.fieldErrors} />
      <SubmitButton pendingText="Working it out…">Work out and save</SubmitButton>
    </form>
  );
}
