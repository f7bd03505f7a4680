"use client";
import { useState } from "react";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { Button } from "@/components/ui/button";
import { CheckboxField } from "@/components/ui/field";
import { SubmitButton } from "@/components/ui/submit-button";
import { manageCalendarLink } from "@/lib/actions/bookings/calendar-link";

type Answer = { url?: string | null } | undefined;

/**
 * The calendar link, shown again whenever its owner opens the page (the same link on every device).
 * Making a new link or turning it off are separate, confirmed choices: both stop every calendar
 * that uses the current link.
 */
export function CalendarLinkPanel({ slug, hasLink, url: shownUrl }: { slug: string; hasLink: boolean; url: string | null }) {
  const make = useFormAction(manageCalendarLink);
  const stop = useFormAction(manageCalendarLink);
  // The newest answer wins until the refreshed page brings the same facts.
  const answered = [make, stop].filter((f) => f.state.ok && f.state.data && "url" in (f.state.data as object)).sort((a, b) => b.answerCount - a.answerCount)[0];
  const url = answered ? ((answered.state.data as Answer)?.url ?? null) : shownUrl;
  const live = answered ? Boolean(url) || (answered === make && hasLink) : hasLink;
  const [copied, setCopied] = useState(false);

  return (
    <div className="grid gap-5">
      {url ? (
        <div>
          <label htmlFor="feed-url" className="field-label">Your calendar link</label>
          <div className="flex flex-wrap gap-2">
            <input id="feed-url" readOnly value={url} className="field-input min-w-0 flex-1 font-mono text-sm" onFocus={(e) => e.currentTarget.select()} />
            <Button
              type="button"
              variant="secondary"
              onClick={() => {
                void navigator.clipboard?.writeText(url).then(() => setCopied(true), () => setCopied(false));
              }}
            >
              Copy link
            </Button>
          </div>
          <p className="mt-1 text-sm text-ink-700" aria-live="polite">
            {copied ? "Copied. " : ""}Use this same link on each of your devices: it is shown here whenever you come back.
          </p>
        </div>
      ) : live ? (
        <p className="text-sm text-ink-700">You have a working calendar link, made before links could be shown again. It keeps working; to see a link here, replace it below (the old one then stops).</p>
      ) : null}

      {/* Kept on screen after it made the link, so its answer stays where it was read. */}
      {!live || make.answerCount > 0 ? (
        <FormShell form={make} label="Make my calendar link">
          <input type="hidden" name="club" value={slug} />
          <input type="hidden" name="intent" value="create" />
          {!live ? (
            <>
              <p className="mb-3 text-sm text-ink-700">You have no calendar link yet.</p>
              <SubmitButton pendingText="Making…">Make my calendar link</SubmitButton>
            </>
          ) : null}
        </FormShell>
      ) : null}
      {live ? (
        <FormShell form={stop} label="Replace or turn off the calendar link" className="rounded border border-sand-300 p-4">
          <h2 className="mb-1 text-base font-bold">Replace or turn off the link</h2>
          <p className="mb-3 text-sm text-ink-700">
            Do this only if the link reached someone it should not have. Every calendar using the current link stops updating; with a new link you add it again in each of them.
          </p>
          <input type="hidden" name="club" value={slug} />
          <CheckboxField label="I understand: calendars using the current link stop updating." name="confirm" value="yes" errors={stop.state.fieldErrors.confirm} />
          <div className="flex flex-wrap gap-2">
            <SubmitButton name="intent" value="rotate" variant="secondary" pendingText="Replacing…">Replace with a new link</SubmitButton>
            <SubmitButton name="intent" value="revoke" variant="danger" pendingText="Turning off…">Turn the link off</SubmitButton>
          </div>
        </FormShell>
      ) : null}
    </div>
  );
}
