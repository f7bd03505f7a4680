import type { AircraftStatus } from "@/lib/airworthiness";
import { STATUS_WORDS } from "@/lib/fleet/status-words";

// Status is a word and a shape, never colour alone. Our own shapes: flyable a filled circle,
// flyable with limits a half-filled triangle, grounded a square crossed by a bar, check status
// a diamond holding a question mark.

const TONE: Record<AircraftStatus, string> = {
  flyable: "border-go-600 bg-go-100 text-go-800",
  limited: "border-sock-500 bg-sock-100 text-sock-700",
  grounded: "border-stop-600 bg-stop-100 text-stop-800",
  unknown: "border-ask-600 bg-ask-100 text-ask-800",
};

export function StatusShape({ status, size = 18 }: { status: AircraftStatus; size?: number }) {
  const common = { width: size, height: size, viewBox: "0 0 20 20", "aria-hidden": true, focusable: false, "data-shape": status } as const;
  switch (status) {
    case "flyable":
      return (
        <svg {...common}>
          <circle cx="10" cy="10" r="8" fill="currentColor" />
        </svg>
      );
    case "limited":
      return (
        <svg {...common}>
          <path d="M10 2 L18.5 17.5 L1.5 17.5 Z" fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round" />
          <path d="M10 2 L10 17.5 L1.5 17.5 Z" fill="currentColor" />
        </svg>
      );
    case "grounded":
      return (
        <svg {...common}>
          <rect x="2" y="2" width="16" height="16" fill="none" stroke="currentColor" strokeWidth="2.2" />
          <rect x="2" y="8.5" width="16" height="3.4" fill="currentColor" />
        </svg>
      );
    case "unknown":
      return (
        <svg {...common}>
          <path d="M10 1 L19 10 L10 19 L1 10 Z" fill="none" stroke="currentColor" strokeWidth="2" strokeLinejoin="round" />
          <text x="10" y="14.2" textAnchor="middle" fontSize="11" fontWeight="700" fill="currentColor" fontFamily="sans-serif">?</text>
        </svg>
      );
  }
}

export function StatusBadge({ status, large = false }: { status: AircraftStatus; large?: boolean }) {
  return (
    <span
      className={`inline-flex items-center gap-1.5 whitespace-nowrap rounded border font-bold ${TONE[status]} ${large ? "px-3 py-1.5 text-base" : "px-2 py-0.5 text-sm"}`}
      data-status={status}
    >
      <StatusShape status={status} size={large ? 20 : 16} />
      <span>{STATUS_WORDS[status]}</span>
    </span>
  );
}
