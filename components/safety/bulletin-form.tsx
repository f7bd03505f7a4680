"use client";
import { FormShell } from "@/components/ui/form-shell";
import { useFormAction } from "@/components/ui/use-form-action";
import { useState } from "react";
import { buttonClass } from "@/components/ui/button";
import { Field, SelectField } from "@/components/ui/field";
import { createBulletin } from "@/lib/actions/safety/create-bulletin";
import { updateDraft } from "@/lib/actions/safety/update-draft";
import { BULLETIN_URGENCIES, type BulletinAudience, type BulletinUrgency } from "@/db/schema/safety";
import { URGENCY_HINTS, URGENCY_LABELS } from "@/lib/safety/labels";

export type BulletinFormValues = {
  title: string;
  bodyMarkdown: string;
  urgency: BulletinUrgency;
  audience: BulletinAudience;
  audienceTypeGroup: string | null;
  acknowledgeBy: string | null;
};

type Props = {
  slug: string;
  typeGroups: string[];
  canPublish: boolean;
  initial?: Partial<BulletinFormValues>;
  /** Editing an existing draft. */
  bulletinId?: string;
  supersedesId?: string;
  sourceReportId?: string;
  today: string;
};

function IntentButtons({ canPublish, revision, pending }: { canPublish: boolean; revision: boolean; pending: boolean }) {
  return (
    <div className="flex flex-wrap gap-3">
      {canPublish ? (
        <button type="submit" name="intent" value="publish" className={buttonClass("primary")}>
          {pending ? "Working…" : revision ? "Publish this revision" : "Publish and send"}
        </button>
      ) : null}
      <button type="submit" name="intent" value="draft" className={buttonClass("secondary")}>
        Save as draft
      </button>
    </div>
  );
}

export function BulletinForm({ slug, typeGroups, canPublish, initial = {}, bulletinId, supersedesId, sourceReportId, today }: Props) {
  const form = useFormAction(bulletinId ? updateDraft : createBulletin);
  const { state, pending } = form;
  const [audience, setAudience] = useState<BulletinAudience>(initial.audience ?? "everyone");
  const errors = state.fieldErrors;
  return (
    <FormShell form={form} label={bulletinId ? "Edit draft bulletin" : supersedesId ? "Revise bulletin" : "New bulletin"} className="max-w-3xl">
      <input type="hidden" name="club" value={slug} />
      {bulletinId ? <input type="hidden" name="bulletinId" value={bulletinId} /> : null}
      {supersedesId ? <input type="hidden" name="supersedesId" value={supersedesId} /> : null}
      {sourceReportId ? <input type="hidden" name="sourceReportId" value={sourceReportId} /> : null}
      <Field label="Title" name="title" defaultValue={initial.title ?? ""} required maxLength={160} errors={errors.title} />
      <div className="mb-4">
        <label htmlFor="f-bodyMarkdown" className="field-label">Text</label>
        <textarea
          id="f-bodyMarkdown"
          name="bodyMarkdown"
          rows={12}
          className="field-input font-mono text-sm"
          defaultValue={initial.bodyMarkdown ?? ""}
          aria-invalid={errors.bodyMarkdown?.length ? true : undefined}
          aria-describedby="f-bodyMarkdown-hint"
        />
        <p id="f-bodyMarkdown-hint" className="mt-1 text-sm text-ink-500">Markdown: **bold**, *italic*, lists with “- ”, links as [words](https://…). HTML is not shown.</p>
        {errors.bodyMarkdown?.length ? <p className="field-error">{errors.bodyMarkdown.join(" ")}</p> : null}
      </div>
      <fieldset className="mb-4">
        <legend className="field-label">Urgency</legend>
        <div className="grid gap-2 sm:grid-cols-3">
          {BULLETIN_URGENCIES.map((u) => (
            <label key={u} className="flex items-start gap-2 rounded border border-sand-300 bg-sand-50 p-2">
              <input type="radio" name="urgency" value={u} defaultChecked={(initial.urgency ?? "routine") === u} className="mt-1 size-4" />
              <span><span className="font-bold">{URGENCY_LABELS[u]}</span><span className="block text-xs text-ink-500">{URGENCY_HINTS[u]}</span></span>
            </label>
          ))}
        </div>
        {errors.urgency?.length ? <p className="field-error">{errors.urgency.join(" ")}</p> : null}
      </fieldset>
      <div className="grid gap-x-4 sm:grid-cols-2">
        <SelectField label="Audience" name="audience" value={audience} onChange={(e) => setAudience(e.target.value as BulletinAudience)} errors={errors.audience}>
          <option value="everyone">Every member</option>
          <option value="instructors">Instructors</option>
          <option value="type_group">Members checked out in a type group</option>
        </SelectField>
        {audience === "type_group" ? (
          <SelectField label="Type group" name="audienceTypeGroup" defaultValue={initial.audienceTypeGroup ?? ""} errors={errors.audienceTypeGroup}>
            <option value="">Choose…</option>
            {typeGroups.map((g) => (
              <option key={g} value={g}>{g}</option>
            ))}
          </SelectField>
        ) : null}
      </div>
      <div className="grid gap-x-4 sm:grid-cols-2">
        <Field label="Acknowledge by (optional)" name="acknowledgeBy" type="date" min={today} defaultValue={initial.acknowledgeBy ?? ""} errors={errors.acknowledgeBy} hint="Members see the deadline; you can remind those who have not acknowledged." />
        <Field label="Attachment (optional)" name="attachment" type="file" accept="application/pdf,image/jpeg,image/png,image/webp,image/heic" errors={errors.attachment} hint="PDF or photo, up to 10 MB." />
      </div>
      {supersedesId ? <p className="mb-4 rounded border border-sand-300 bg-sand-50 p-3 text-sm">Publishing makes this the current version. The earlier version stays on record, marked as replaced, and members are asked to acknowledge the new one.</p> : null}
      <IntentButtons canPublish={canPublish} revision={!!supersedesId} pending={pending} />
    </FormShell>
  );
}
