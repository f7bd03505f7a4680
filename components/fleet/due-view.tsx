import { formatHours } from "@/lib/airworthiness";
import { formatDateWords } from "@/lib/dates/words";
import { DUE_EFFECT_WORDS, DUE_STATE_WORDS, dueMargin, dueState, groupForDueView, remainingWords, type DueState } from "@/lib/fleet/due-words";
import type { DueSummary } from "@/lib/fleet/types";
import { lateText, meterWord } from "./due-text";
import { QuestionMark } from "@/components/ui/status-badge";

// Our due view: each item a card that says in words how much remains, with a bar of the margin
// left of its interval, grouped by what the item does when it comes due (grounds, stops IFR,
// reminds). State is a word and a glyph, never colour alone.

const STATE_TONE: Record<DueState, { card: string; bar: string; text: string }> = {
  overdue: { card: "border-l-plum-800 bg-plum-50", bar: "bg-plum-800", text: "text-plum-800" },
  unknown: { card: "border-l-fog-600 border-dashed bg-fog-50", bar: "bg-fog-600", text: "text-fog-800" },
  soon: { card: "border-l-dusk-600 bg-dusk-50", bar: "bg-dusk-600", text: "text-dusk-800" },
  ok: { card: "border-l-sky-600 bg-white", bar: "bg-sky-600", text: "text-sky-800" },
};

/** Small glyphs of the item states (no data-shape: that marks the aircraft's own status). */
export function DueGlyph({ state, size = 16 }: { state: DueState; size?: number }) {
  const common = { width: size, height: size, viewBox: "0 0 20 20", "aria-hidden": true, focusable: false, className: "shrink-0" } as const;
  switch (state) {
    case "overdue":
      return (
        <svg {...common}>
          <rect x="2" y="2" width="16" height="16" rx="2.5" fill="currentColor" />
          <rect x="5" y="8.6" width="10" height="2.8" rx="1" fill="#fff" />
        </svg>
      );
    case "unknown":
      return (
        <svg {...common}>
          <circle cx="10" cy="10" r="8" fill="none" stroke="currentColor" strokeWidth="2" strokeDasharray="3 2" />
          <QuestionMark />
        </svg>
      );
    case "soon":
      return (
        <svg {...common}>
          <circle cx="10" cy="10" r="8" fill="none" stroke="currentColor" strokeWidth="2" />
          <path d="M10 10 L10 2 A8 8 0 0 1 17.5 12.7 Z" fill="currentColor" />
        </svg>
      );
    case "ok":
      return (
        <svg {...common}>
          <circle cx="10" cy="10" r="8" fill="none" stroke="currentColor" strokeWidth="2" />
          <path d="M10 10 L10 2 A8 8 0 1 1 2.4 12.5 Z" fill="currentColor" opacity="0.35" />
        </svg>
      );
  }
}

function comesDue(d: DueSummary, meterNow: string): string | null {
  const parts: string[] = [];
  if (d.dueDate !== null) parts.push(formatDateWords(d.dueDate));
  if (d.dueHours !== null && !d.otherMeter) parts.push(`${formatHours(d.dueHours)} h on the ${meterNow}`);
  return parts.length ? `Comes due ${parts.join(" or at ")}` : null;
}

function lastDone(d: DueSummary): string {
  if (!d.lastDoneOn) return "No completion on record";
  const at = d.lastDoneHours !== null && d.lastDoneHours !== undefined ? ` at ${formatHours(d.lastDoneHours)} h${d.lastDoneMeter ? ` on the ${meterWord(d.lastDoneMeter)}` : ""}` : "";
  return `Last done ${formatDateWords(d.lastDoneOn)}${at}`;
}

function DueItem({ d, meterNow }: { d: DueSummary; meterNow: string }) {
  const state = dueState(d);
  const tone = STATE_TONE[state];
  const margin = dueMargin(d);
  const when = comesDue(d, meterNow);
  return (
    <li className={`rounded border border-sand-300 border-l-4 p-3 ${tone.card}`} data-due-state={state}>
      <div className="flex flex-wrap items-baseline justify-between gap-x-3 gap-y-1">
        <h4 className="font-bold">{d.name}</h4>
        <span className={`inline-flex items-center gap-1 text-sm font-bold ${tone.text}`}>
          <DueGlyph state={state} size={15} />
          {DUE_STATE_WORDS[state]}
        </span>
      </div>
      <p className={`mt-1 text-base ${state === "ok" ? "text-ink-900" : `font-bold ${tone.text}`}`}>{remainingWords(d)}</p>
      {margin !== null ? (
        <div className={`mt-2 h-2 w-full overflow-hidden rounded-full ${state === "overdue" ? "bg-plum-100" : "bg-sand-200"}`} aria-hidden="true" data-margin={margin.toFixed(2)}>
          {margin > 0 ? <div className={`h-full rounded-full ${tone.bar}`} style={{ width: `${Math.max(margin * 100, 2)}%` }} /> : null}
        </div>
      ) : null}
      <p className="mt-2 text-sm text-ink-700">
        {when ? <>{when} · </> : null}
        {lastDone(d)}
        {d.source ? <> · {d.source}</> : null}
        {d.ifrOnly ? " · IFR only" : ""}
      </p>
      {d.late ? <p className="mt-1 text-sm font-bold text-plum-800">Done late: {lateText(d.late)}</p> : null}
    </li>
  );
}

/** Every applicable item of one aircraft, grouped by what it does when it comes due. */
export function DueView({ due, caption, meterNow }: { due: DueSummary[]; caption: string; meterNow: "hobbs" | "tach" }) {
  const groups = groupForDueView(due);
  if (groups.length === 0) return <p className="text-ink-700">No inspection items apply to this aircraft.</p>;
  return (
    <div className="space-y-5" aria-label={caption} role="group">
      {groups.map((g) => (
        <section key={g.effect} aria-labelledby={`due-${g.effect}`}>
          <h3 id={`due-${g.effect}`} className="text-base font-bold">{DUE_EFFECT_WORDS[g.effect].heading}</h3>
          <p className="mb-2 text-sm text-ink-500">{DUE_EFFECT_WORDS[g.effect].lead}</p>
          <ul className="grid gap-2 md:grid-cols-2">
            {g.items.map((d) => <DueItem key={d.key} d={d} meterNow={meterWord(meterNow)} />)}
          </ul>
        </section>
      ))}
    </div>
  );
}
