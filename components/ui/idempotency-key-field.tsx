"use client";
import { useEffect, useState } from "react";

/** The form field the server reads (lib/server/idempotency.ts IDEMPOTENCY_FIELD). */
export const IDEMPOTENCY_FIELD_NAME = "idempotencyKey";

/** A random v4 UUID; crypto.randomUUID needs a secure context, getRandomValues does not (a phone on the LAN over http). */
export function newIdempotencyKey(): string {
  if (typeof crypto.randomUUID === "function") return crypto.randomUUID();
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = ((b[6] ?? 0) & 0x0f) | 0x40;
  b[8] = ((b[8] ?? 0) & 0x3f) | 0x80;
  const h = Array.from(b, (x) => x.toString(16).padStart(2, "0")).join("");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

/**
 * The submission key of one shown form: made once when the form mounts (after hydration, so the
 * server's HTML and the browser agree), kept across retries and refused submissions (the server
 * stores nothing for a refusal, so a corrected resend with the same key goes through), and renewed
 * when the form's answer comes back ok, so the next, different submission is not taken for a replay.
 */
export function useIdempotencyKey(answer?: { ok: boolean } | null): string {
  const [key, setKey] = useState("");
  const [seen, setSeen] = useState(answer);
  useEffect(() => {
    setKey((k) => k || newIdempotencyKey());
  }, []);
  if (answer !== seen) {
    setSeen(answer);
    if (answer?.ok) setKey(newIdempotencyKey());
  }
  return key;
}

/**
 * Put one inside every form that posts to a server action: `<IdempotencyKeyField answer={state} />`
 * (`state` from useActionState / useKeptForm). A second press, a retry or a replay of the same
 * submission then gets the first answer back and writes nothing new.
 */
export function IdempotencyKeyField({ answer }: { answer?: { ok: boolean } | null }) {
  const key = useIdempotencyKey(answer);
  return <input type="hidden" name={IDEMPOTENCY_FIELD_NAME} value={key} />;
}
