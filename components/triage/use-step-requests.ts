"use client";
import { startTransition, useLayoutEffect, useRef, useState } from "react";

/**
 * Under this a reply feels instantaneous, so nothing on screen says "saving" before it: J. Nielsen,
 * Usability Engineering (1993), ch. 5, "Response times" (0.1 s).
 */
export const SAVING_SHOWN_AFTER_MS = 100;

export interface StepRequests {
  /**
   * Sends one request (an answer or an undo) unless one is already under way, then applies its
   * outcome (the action's result, or the Error it threw) in one render.
   */
  send<T>(request: () => Promise<T>, apply: (outcome: T | Error) => void): void;
  /** True once a request has taken longer than SAVING_SHOWN_AFTER_MS, until its outcome is shown. */
  saving: boolean;
}

/**
 * One answer or undo at a time on the walk screen. The screen is not rendered again while a
 * request is in flight: the browser and the server share two cores here, and a render at the
 * keypress slowed the server's reply by several ms. The guard is released in the commit that shows
 * the outcome (a layout effect, like the answer keys' handlers), so a key pressed before that commit
 * is dropped as on a disabled button, and one pressed after it reaches the screen that shows the
 * outcome.
 */
export function useStepRequests(): StepRequests {
  const underWay = useRef(false);
  const [saving, setSaving] = useState(false);
  const [shown, setShown] = useState(0);
  useLayoutEffect(() => {
    underWay.current = false;
  }, [shown]);

  function send<T>(request: () => Promise<T>, apply: (outcome: T | Error) => void): void {
    if (underWay.current) return;
    underWay.current = true;
    const timer = setTimeout(() => setSaving(true), SAVING_SHOWN_AFTER_MS);
    request()
      .catch((error: unknown) => (error instanceof Error ? error : new Error(String(error))))
      .then((outcome) => {
        clearTimeout(timer);
        startTransition(() => {
          apply(outcome);
          setSaving(false);
          setShown((n) => n + 1);
        });
      });
  }

  return { send, saving };
}
