import type { AircraftStatus } from "@/lib/airworthiness";
import { STATUS_WORDS } from "@/lib/fleet/status-words";

// The one status mark, used wherever an aircraft's status appears (flight line, aircraft page,
// club home, bookings, maintenance). Status is a word, a glyph and a border style, never colour
// alone; our own glyphs and palette (components shipped with the app, nothing fetched):
//   flyable   — a ring holding a climbing chevron, solid sky-blue border
//   limited   — a hexagon cut by a limit line, lower half filled, double dusk-violet border
//   grounded  — a filled block crossed out in white, solid plum badge with white text
//   unknown   — a dashed ring holding a question mark, dashed fog-slate border
// A status that is missing altogether (nothing computed) shows as unknown, never as flyable.

type StatusOrNothing = AircraftStatus | null | undefined;

const TONE: Record<AircraftStatus, string> = {
  flyable: "border-2 border-solid border-sky-600 bg-sky-50 text-sky-800",
  limited: "border-[3px] border-double border-dusk-600 bg-dusk-50 text-dusk-800",
  grounded: "border-2 border-solid border-plum-800 bg-plum-800 text-white",
  unknown: "border-2 border-dashed border-fog-600 bg-fog-50 text-fog-800",
};

/** Text colour that goes with each status where the word stands without a badge. */
export const STATUS_TEXT_TONE: Record<AircraftStatus, string> = {
  flyable: "text-sky-800",
  limited: "text-dusk-800",
  grounded: "text-plum-800",
  unknown: "text-fog-800",
};

/**
 * The question mark of the "unknown" marks (20 × 20 box), drawn, not typed: a glyph must not add a
 * character to the text around it (a badge's, a due item's).
 */
export function QuestionMark() {
  return (
    <>
      <path d="M7.4 7.6 C7.4 5.9 8.6 5 10 5 C11.5 5 12.6 5.9 12.6 7.3 C12.6 8.6 11.7 9.1 10.9 9.6 C10.3 10 10 10.4 10 11.3" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
      <circle cx="10" cy="14.3" r="1.3" fill="currentColor" />
    </>
  );
}

function known(status: StatusOrNothing): AircraftStatus {
  return status ?? "unknown";
}

export function StatusShape({ status, size = 18 }: { status: StatusOrNothing; size?: number }) {
  const s = known(status);
  const common = { width: size, height: size, viewBox: "0 0 20 20", "aria-hidden": true, focusable: false, "data-shape": s, className: "shrink-0" } as const;
  switch (s) {
    case "flyable":
      return (
        <svg {...common}>
          <circle cx="10" cy="10" r="8.2" fill="none" stroke="currentColor" strokeWidth="2" />
          <path d="M5.6 12.4 L10 7.6 L14.4 12.4" fill="none" stroke="currentColor" strokeWidth="2.6" strokeLinecap="round" strokeLinejoin="round" />
        </svg>
      );
    case "limited":
      return (
        <svg {...common}>
          <path d="M10 1.5 L17.4 5.75 L17.4 14.25 L10 18.5 L2.6 14.25 L2.6 5.75 Z" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinejoin="round" />
          <path d="M2.6 10 L17.4 10 L17.4 14.25 L10 18.5 L2.6 14.25 Z" fill="currentColor" />
        </svg>
      );
    case "grounded":
      return (
        <svg {...common}>
          <rect x="1.5" y="1.5" width="17" height="17" rx="2.5" fill="currentColor" />
          <path d="M6 6 L14 14 M14 6 L6 14" stroke="var(--status-cut, #5c1236)" strokeWidth="2.6" strokeLinecap="round" />
        </svg>
      );
    case "unknown":
      return (
        <svg {...common}>
          <circle cx="10" cy="10" r="8.2" fill="none" stroke="currentColor" strokeWidth="2" strokeDasharray="3.2 2.2" />
          <QuestionMark />
        </svg>
      );
  }
}

export function StatusBadge({ status, large = false }: { status: StatusOrNothing; large?: boolean }) {
  const s = known(status);
  return (
    <span
      className={`inline-flex items-center gap-1.5 whitespace-nowrap rounded-full font-bold ${TONE[s]} ${large ? "px-3 py-1 text-base" : "px-2.5 py-0.5 text-sm"}`}
      data-status={s}
    >
      <StatusShape status={s} size={large ? 20 : 16} />
      <span>{STATUS_WORDS[s]}</span>
    </span>
  );
}
