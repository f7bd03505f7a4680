// Our own status words, used by the badge, the e-mails and the JSON route alike.
import type { AircraftStatus } from "@/lib/airworthiness";

export const STATUS_WORDS: Record<AircraftStatus, string> = {
  flyable: "Flyable",
  limited: "Flyable with limits",
  grounded: "Grounded",
  unknown: "Status unknown",
};

export const TRIAGE_WORDS = {
  untriaged: "Awaiting triage",
  grounding: "Grounding",
  deferred: "Deferred (placarded)",
  note: "Note",
} as const;

export const FOUND_DURING_WORDS = {
  preflight: "Preflight",
  flight: "In flight",
  postflight: "After flight",
  maintenance: "Maintenance",
} as const;
