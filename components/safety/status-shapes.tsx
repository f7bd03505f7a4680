import type { BulletinUrgency, ReportStatus } from "@/db/schema/safety";
import { REPORT_STATUS_LABELS, URGENCY_LABELS } from "@/lib/safety/labels";

// Every status is a word and a shape; colour only repeats what both already say.
type Shape = "circle" | "ring" | "triangle" | "octagon" | "half" | "square" | "check" | "cross" | "dashed";

export function ShapeIcon({ shape, className = "" }: { shape: Shape; className?: string }) {
  const common = { width: 14, height: 14, viewBox: "0 0 16 16", "aria-hidden": true, className: `inline-block shrink-0 ${className}` } as const;
  switch (shape) {
    case "circle":
      return <svg {...common}><circle cx="8" cy="8" r="6" fill="currentColor" /></svg>;
    case "ring":
      return <svg {...common}><circle cx="8" cy="8" r="5.5" fill="none" stroke="currentColor" strokeWidth="2" /></svg>;
    case "dashed":
      return <svg {...common}><circle cx="8" cy="8" r="5.5" fill="none" stroke="currentColor" strokeWidth="2" strokeDasharray="3 2" /></svg>;
    case "triangle":
      return <svg {...common}><path d="M8 1.5 L15 14.5 H1 Z" fill="currentColor" /></svg>;
    case "octagon":
      return <svg {...common}><path d="M5 1 H11 L15 5 V11 L11 15 H5 L1 11 V5 Z" fill="currentColor" /></svg>;
    case "half":
      return <svg {...common}><circle cx="8" cy="8" r="5.5" fill="none" stroke="currentColor" strokeWidth="2" /><path d="M8 2.5 A5.5 5.5 0 0 1 8 13.5 Z" fill="currentColor" /></svg>;
    case "square":
      return <svg {...common}><rect x="2" y="2" width="12" height="12" fill="currentColor" /></svg>;
    case "check":
      return <svg {...common}><path d="M2 8.5 L6 12.5 L14 3.5" fill="none" stroke="currentColor" strokeWidth="2.5" /></svg>;
    case "cross":
      return <svg {...common}><path d="M3 3 L13 13 M13 3 L3 13" fill="none" stroke="currentColor" strokeWidth="2.5" /></svg>;
  }
}

const URGENCY_LOOK: Record<BulletinUrgency, { shape: Shape; cls: string }> = {
  routine: { shape: "ring", cls: "border-fin-500 bg-sand-50 text-fin-700" },
  priority: { shape: "triangle", cls: "border-sock-500 bg-sock-100 text-sock-700" },
  urgent: { shape: "octagon", cls: "border-stop-600 bg-stop-100 text-stop-800" },
};

export function UrgencyBadge({ urgency }: { urgency: BulletinUrgency }) {
  const look = URGENCY_LOOK[urgency];
  return (
    <span className={`inline-flex items-center gap-1 rounded border px-2 py-0.5 text-xs font-bold ${look.cls}`}>
      <ShapeIcon shape={look.shape} />
      {URGENCY_LABELS[urgency]}
    </span>
  );
}

const REPORT_LOOK: Record<ReportStatus, { shape: Shape; cls: string }> = {
  received: { shape: "ring", cls: "border-ask-600 bg-ask-100 text-ask-800" },
  reviewing: { shape: "half", cls: "border-sock-500 bg-sock-100 text-sock-700" },
  action_taken: { shape: "square", cls: "border-fin-500 bg-sand-50 text-fin-700" },
  closed: { shape: "check", cls: "border-sand-500 bg-sand-200 text-ink-700" },
};

export function ReportStatusBadge({ status }: { status: ReportStatus }) {
  const look = REPORT_LOOK[status];
  return (
    <span className={`inline-flex items-center gap-1 rounded border px-2 py-0.5 text-xs font-bold ${look.cls}`}>
      <ShapeIcon shape={look.shape} />
      {REPORT_STATUS_LABELS[status]}
    </span>
  );
}
