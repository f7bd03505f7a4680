"use client";
import { useActionState } from "react";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/actions/action-state";
import { manageCalendarLink } from "@/lib/actions/bookings/calendar-link";
import { IdempotencyKeyField } from "@/components/ui/idempotency-key-field";

export function CalendarLinkPanel({ slug, hasLink }: { slug: string; hasLink: boolean }) {
  const [state, action] = useActionState(manageCalendarLink, initialActionState);
  const url = (state.data as { url?: string } | undefined)?.url;
  const live = url ? true : state.ok && state.message.startsWith("Calendar link turned off") ? false : hasLink;
  return (
    <div>
      <FormMessage state={state} />
      {url ? (
        <div className="mb-4">
          <label htmlFor="feed-url" className="field-label">Your calendar link (shown only now: copy it into your calendar program)</label>
          <input id="feed-url" readOnly value={url} className="field-input font-mono text-sm" onFocus={(e) => e.currentTarget.select()} />
        </div>
      ) : null}
      <p className="mb-3 text-sm text-ink-700">{live ? "You have a working calendar link. Making a new one stops the old one." : "You have no calendar link yet."}</p>
      <div className="flex flex-wrap gap-2">
        <form action={action}>
          <IdempotencyKeyField answer={state} />
          <input type="hidden" name="club" value={slug} />
          <input type="hidden" name="intent" value="create" />
          <SubmitButton pendingText="Making…">{live ? "Make a new link" : "Make my calendar link"}</SubmitButton>
        </form>
        {live ? (
          <form action={action}>
            <IdempotencyKeyField answer={state} />
            <input type="hidden" name="club" value={slug} />
            <input type="hidden" name="intent" value="revoke" />
            <SubmitButton variant="danger" pendingText="Turning off…">Turn the link off</SubmitButton>
          </form>
        ) : null}
      </div>
    </div>
  );
}
