// The one way server code writes to the log. A log line names where it happened and what kind of
// error it was, never whose data was involved: a failed query's message carries its SQL and its
// parameters (e-mail addresses, names, amounts), so that text is withheld, and e-mail addresses
// and long digit runs are masked in whatever message is left. No `server-only` here: the
// command-line tools (seed, migrate, outbox worker) log through it too.
import { inspect } from "node:util";

const MAX_MESSAGE = 300;
const STACK_FRAMES = 6;
const EMAIL = /[\w.+-]+@[\w-]+(?:\.[\w-]+)+/g;
const LONG_DIGITS = /\d{9,}/g; // card, phone and account numbers
const SQL_START = /^(failed query:|select |insert |update |delete |replace |with |pragma )/i;

type ErrorLike = { name?: unknown; code?: unknown; message?: unknown; cause?: unknown; stack?: unknown };

/** Masks personal data in free text and drops anything after a `params:` marker. */
export function scrubText(text: string): string {
  let out = text;
  const params = out.search(/\bparams\s*[:=]/i);
  if (params >= 0) out = `${out.slice(0, params)}[parameters withheld]`;
  out = out.replace(EMAIL, "[email]").replace(LONG_DIGITS, "[number]");
  return out.length > MAX_MESSAGE ? `${out.slice(0, MAX_MESSAGE)}…` : out;
}

/** The error's class when its `name` is the generic one (drizzle's query error keeps "Error"). */
function nameOf(e: ErrorLike): string {
  const ctor = (e as { constructor?: { name?: unknown } }).constructor?.name;
  if (typeof e.name === "string" && e.name !== "Error") return e.name;
  return typeof ctor === "string" && ctor !== "Object" && ctor !== "" ? ctor : "Error";
}

function isQueryError(e: ErrorLike): boolean {
  return nameOf(e) === "DrizzleQueryError" || (typeof e.message === "string" && /^Failed query:/.test(e.message)) || "params" in (e as object);
}

function messageOf(e: ErrorLike): string {
  const message = typeof e.message === "string" ? e.message : "";
  // The statement itself (with its literals) and its parameters stay out of the log entirely.
  if (isQueryError(e) || SQL_START.test(message.trim())) return "database query failed (statement and parameters withheld)";
  return scrubText(message);
}

function framesOf(e: ErrorLike): string {
  if (typeof e.stack !== "string") return "";
  // The stack's first lines repeat the message; only the "at …" frames are kept.
  const frames = e.stack.split("\n").filter((line) => /^\s+at /.test(line)).slice(0, STACK_FRAMES);
  return frames.length ? `\n${frames.map((f) => scrubText(f.trimEnd())).join("\n")}` : "";
}

/** One line for an error: name, code and a scrubbed message, then the causes, then a few frames. */
export function describeError(error: unknown, withFrames = true): string {
  if (!(error && typeof error === "object")) return scrubText(String(error));
  const parts: string[] = [];
  let current: ErrorLike | undefined = error as ErrorLike;
  for (let depth = 0; current && depth < 4; depth++) {
    const name = nameOf(current);
    const code = typeof current.code === "string" || typeof current.code === "number" ? ` [${current.code}]` : "";
    // The digest is what the error page shows the person: it ties their report to this line.
    const digest = typeof (current as { digest?: unknown }).digest === "string" ? ` (digest ${(current as { digest: string }).digest})` : "";
    parts.push(`${name}${code}: ${messageOf(current)}${digest}`);
    current = current.cause && typeof current.cause === "object" ? (current.cause as ErrorLike) : undefined;
  }
  return parts.join(" ← caused by ") + (withFrames ? framesOf(error as ErrorLike) : "");
}

type Detail = string | number | boolean | null | undefined;

function format(scope: string, message: string, error: unknown, details?: Record<string, Detail>): string {
  const extra = details
    ? Object.entries(details)
        .filter(([, v]) => v !== undefined)
        .map(([k, v]) => ` ${k}=${scrubText(String(v))}`)
        .join("")
    : "";
  return `[${scope}] ${scrubText(message)}${extra}${error === undefined ? "" : ` — ${describeError(error)}`}`;
}

type Sink = Pick<Console, "error" | "warn" | "info">;
// The console methods as they were before installConsoleScrubber() replaced them (so the helper
// never loops); until then, the console itself.
// Kept on globalThis: the server bundles this module more than once (instrumentation, routes).
const shared = globalThis as unknown as { __hangarlineRawConsole?: Sink | null };
const out = (): Sink => shared.__hangarlineRawConsole ?? console;

/**
 * An unexpected failure. `details` are identifiers only (an event id, a row id), never names or
 * addresses; they are scrubbed all the same.
 */
export function logError(scope: string, message: string, error?: unknown, details?: Record<string, Detail>): void {
  out().error(format(scope, message, error, details));
}

export function logWarn(scope: string, message: string, error?: unknown, details?: Record<string, Detail>): void {
  out().warn(format(scope, message, error, details));
}

export function logInfo(scope: string, message: string, details?: Record<string, Detail>): void {
  out().info(format(scope, message, undefined, details));
}

function scrubArg(arg: unknown): unknown {
  if (typeof arg === "string") return scrubText(arg);
  if (arg instanceof Error) return describeError(arg);
  if (arg && typeof arg === "object") return scrubText(inspect(arg, { depth: 2, breakLength: Infinity }));
  return arg;
}

/**
 * The framework logs what a page or route handler throws (with the error's message) on its own;
 * this makes those lines pass the same scrubbing. Installed once per server process; returns
 * the undo (for tests).
 */
export function installConsoleScrubber(): () => void {
  if (shared.__hangarlineRawConsole) return () => undefined;
  const before: Sink = { error: console.error, warn: console.warn, info: console.info };
  const raw: Sink = { error: before.error.bind(console), warn: before.warn.bind(console), info: before.info.bind(console) };
  shared.__hangarlineRawConsole = raw;
  console.error = (...args: unknown[]) => raw.error(...args.map(scrubArg));
  console.warn = (...args: unknown[]) => raw.warn(...args.map(scrubArg));
  return () => {
    console.error = before.error;
    console.warn = before.warn;
    shared.__hangarlineRawConsole = null;
  };
}
