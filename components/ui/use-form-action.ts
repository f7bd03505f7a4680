"use client";
import { useRouter } from "next/navigation";
import { useCallback, useEffect, useRef, useState, useTransition, type FormEvent, type RefObject } from "react";
import { initialActionState, type ActionState } from "@/lib/actions/action-state";
import { NAVIGATION_PATIENCE_MS } from "./navigation-watchdog";

export type FormAction<R = unknown> = (prev: ActionState, formData: FormData) => Promise<ActionState<R>>;

export type FormActionHandle<R = unknown> = {
  /** The latest answer (initialActionState before the first). */
  state: ActionState<R>;
  /** True from the press until the answer is shown. */
  pending: boolean;
  /** Grows by one with every answer: a new answer is a new message even when its words repeat. */
  answerCount: number;
  formRef: RefObject<HTMLFormElement | null>;
  onSubmit: (event: FormEvent<HTMLFormElement>) => void;
  /** Sends FormData without a form (a button that writes fixed values). */
  formAction: (formData: FormData) => Promise<ActionState<R>>;
};

/** How long a follow-up (navigation or refresh) may take before the page is loaded the plain way. */
const FOLLOW_UP_PATIENCE_MS = NAVIGATION_PATIENCE_MS;

const NO_ANSWER: ActionState = {
  ok: false,
  message: "The server could not be reached, so this may not have been saved. Press again: the same submission is never saved twice.",
  fieldErrors: {},
};

/** A path on this site for the router, or null when the target is another origin (or unreadable). */
function sameOriginPath(target: string): string | null {
  try {
    const url = new URL(target, window.location.href);
    return url.origin === window.location.origin ? `${url.pathname}${url.search}${url.hash}` : null;
  } catch {
    return null;
  }
}

/**
 * The one way a form talks to its server action (DEVELOPERS.md "Forms"). The form's own submit
 * event is stopped and the action is called directly — not through `<form action>` — so that:
 *  - React never resets the form: after a refusal every typed value (and chosen file) stays;
 *    after an ok answer the form is cleared here (unless `keepValuesAfterOk`);
 *  - the answer is put into this component's state as an ordinary update the moment it arrives,
 *    outside any transition, so no router transition (a refresh, a navigation, a loading
 *    boundary) can hold it back;
 *  - only then the follow-up runs: `redirectTo` on this origin → router.push, elsewhere →
 *    window.location.assign; `refresh` → router.refresh().
 * `fullPageLoad` loads the redirect's page afresh even on this origin (signing in or out: nothing of
 * the previous session's client state may survive).
 * After a refusal the first field marked aria-invalid gets the focus. One submission at a time:
 * a second press while pending does nothing (the idempotency key covers a retry after that).
 */
export function useFormAction<R = unknown>(action: FormAction<R>, options: { keepValuesAfterOk?: boolean; fullPageLoad?: boolean; onAnswer?: (state: ActionState<R>) => void } = {}): FormActionHandle<R> {
  const router = useRouter();
  const [state, setState] = useState<ActionState<R>>(initialActionState as ActionState<R>);
  const [pending, setPending] = useState(false);
  const [answerCount, setAnswerCount] = useState(0);
  const formRef = useRef<HTMLFormElement | null>(null);
  const latest = useRef<ActionState<R>>(state);
  const busy = useRef(false);
  const opts = useRef(options);
  opts.current = options;
  // The follow-up runs in its own transition, so that we can tell whether it ever committed.
  const [followingUp, startFollowUp] = useTransition();
  const followUpPending = useRef(false);
  followUpPending.current = followingUp;
  // A form the refreshed page no longer shows (a lifted notice's form) unmounts: its refresh landed.
  const mounted = useRef(true);
  const followUpSeq = useRef(0);
  useEffect(() => {
    mounted.current = true;
    return () => {
      mounted.current = false;
    };
  }, []);

  /**
   * The follow-up the answer asked for. It starts on a later task: Next's router queue still holds
   * the server action's own entry when the answer arrives, and a navigation started then makes the
   * router discard that entry, whose transition never settles. If the router still has not committed
   * after FOLLOW_UP_PATIENCE_MS, the page is loaded the plain way (the answer was already shown).
   */
  const followUp = useCallback(
    (answer: ActionState<R>) => {
      const target = answer.ok && answer.redirectTo ? answer.redirectTo : null;
      if (!target && !answer.refresh) return;
      const seq = ++followUpSeq.current;
      window.setTimeout(() => {
        const path = target ? sameOriginPath(target) : null;
        if (target && (!path || opts.current.fullPageLoad)) {
          window.location.assign(target);
          return;
        }
        startFollowUp(() => (path ? router.push(path) : router.refresh()));
        window.setTimeout(() => {
          const landed = path ? `${window.location.pathname}${window.location.search}${window.location.hash}` === path : !mounted.current || !followUpPending.current;
          // Only for the latest follow-up, and never while another submission is on its way.
          if (landed || seq !== followUpSeq.current || busy.current) return;
          if (path) window.location.assign(path);
          else window.location.reload();
        }, FOLLOW_UP_PATIENCE_MS);
      }, 0);
    },
    [router],
  );

  const formAction = useCallback(
    async (formData: FormData): Promise<ActionState<R>> => {
      if (busy.current) return latest.current;
      busy.current = true;
      setPending(true);
      let answer: ActionState<R>;
      try {
        answer = await action(latest.current, formData);
        if (!answer || typeof answer !== "object" || typeof answer.ok !== "boolean") answer = NO_ANSWER as ActionState<R>;
      } catch {
        answer = NO_ANSWER as ActionState<R>;
      }
      busy.current = false;
      latest.current = answer;
      // The answer first: a plain state update, committed on its own.
      setState(answer);
      setPending(false);
      setAnswerCount((n) => n + 1);
      if (answer.ok && !opts.current.keepValuesAfterOk) formRef.current?.reset();
      opts.current.onAnswer?.(answer);
      // Then the follow-up, which may take as long as it likes.
      followUp(answer);
      return answer;
    },
    [action, followUp],
  );

  const onSubmit = useCallback(
    (event: FormEvent<HTMLFormElement>) => {
      event.preventDefault();
      const submitter = (event.nativeEvent as SubmitEvent).submitter;
      void formAction(new FormData(event.currentTarget, submitter instanceof HTMLElement ? submitter : null));
    },
    [formAction],
  );

  // After a refusal: focus the first field the answer marked invalid.
  useEffect(() => {
    if (answerCount === 0 || state.ok) return;
    const first = formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]');
    first?.focus();
  }, [answerCount, state.ok]);

  return { state, pending, answerCount, formRef, onSubmit, formAction };
}
