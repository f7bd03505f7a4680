"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { SubmitButton } from "@/components/ui/submit-button";
import { manageCalendarLink } from "@/lib/actions/bookings/calendar-link";

export function CalendarLinkPanel({ slug, hasLink }: { slug: string; hasLink: boolean }) {
  const form = useFormAction(manageCalendarLink);
  const { state } = form;
  const url = (state.data as { url?: string } | undefined)?.url;
  const live = url ? true : state.ok && state.message.startsWith("Calendar link turned off") ? false : hasLink;
  // One form, two buttons (the pressed one's intent goes with it): one answer, one key.
  return (
    <FormShell form={form} label="Calendar link">
      {url ? (
        <div className="mb-4">
          <label htmlFor="feed-url" className="field-label">Your calendar link (shown only now: copy it into your calendar program)</label>
          <input id="feed-url" readOnly value={url} className="field-input font-mono text-sm" onFocus={(e) => e.currentTarget.select()} />
        </div>
      ) : null}
      <p className="mb-3 text-sm text-ink-700">{live ? "You have a working calendar link. Making a new one stops the old one." : "You have no calendar link yet."}</p>
      <input type="hidden" name="club" value={slug} />
      <div className="flex flex-wrap gap-2">
        <SubmitButton name="intent" value="create" pendingText="Making…">{live ? "Make a new link" : "Make my calendar link"}</SubmitButton>
        {live ? <SubmitButton name="intent" value="revoke" variant="danger" pendingText="Turning off…">Turn the link off</SubmitButton> : null}
      </div>
    </FormShell>
  );
}
