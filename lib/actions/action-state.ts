export type ActionState<T = unknown> = {
  ok: boolean;
  message: string;
  fieldErrors: Record<string, string[]>;
  data?: T;
};

export const initialActionState: ActionState = { ok: false, message: "", fieldErrors: {} };

/** Thrown inside an action body for an expected refusal; becomes the returned state. */
export class ActionError extends Error {
  constructor(
    message: string,
    readonly fieldErrors: Record<string, string[]> = {},
    readonly code: "invalid" | "forbidden" | "not_found" | "conflict" = "invalid",
  ) {
    super(message);
  }
}
