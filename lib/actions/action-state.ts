/**
 * What every server action answers. An action never redirects or revalidates on the server: it
 * returns its answer, and the form's hook (components/ui/use-form-action.ts) shows it first and
 * then does the follow-up the answer asks for — `redirectTo` (same origin: a client navigation;
 * another origin such as a hosted payment page: a full page load) or `refresh` (the current
 * page's server data again).
 */
export type ActionState<T = unknown> = {
  ok: boolean;
  message: string;
  fieldErrors: Record<string, string[]>;
  data?: T;
  /** After the answer is shown: go here (a path on this site, or a full URL elsewhere). */
  redirectTo?: string;
  /** After the answer is shown: fetch this page's server data again. */
  refresh?: boolean;
};

export const initialActionState: ActionState = { ok: false, message: "", fieldErrors: {} };

/** Thrown inside an action body for an expected refusal; becomes the returned state. */
export class ActionError extends Error {
  constructor(
    message: string,
    readonly fieldErrors: Record<string, string[]> = {},
    readonly code: "invalid" | "forbidden" | "not_found" | "conflict" = "invalid",
    /** What the form needs to ask again (e.g. the accounts found in a statement file); nothing was written. */
    readonly data?: unknown,
  ) {
    super(message);
  }
}
