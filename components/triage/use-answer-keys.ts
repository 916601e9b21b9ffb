"use client";
import { useEffect, useLayoutEffect, useRef } from "react";

export interface AnswerKeys {
  /** Called with 0 for key 1, 1 for key 2, … up to key 9. */
  onNumber: (index: number) => void;
  onSkip?: () => void;
  onUndo?: () => void;
}

function typingInto(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  return target.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(target.tagName);
}

/** Number keys 1–9 answer, S skips, U undoes; never while typing in a field or with a modifier held. */
export function useAnswerKeys(keys: AnswerKeys): void {
  const latest = useRef(keys);
  // Updated as the render is committed, before the browser handles another key: a passive effect
  // runs after paint, and a key pressed in between reached the previous render's handlers (an
  // answer pressed just after the last one was confirmed was dropped as "still pending").
  useLayoutEffect(() => {
    latest.current = keys;
  });
  useEffect(() => {
    function onKey(event: KeyboardEvent) {
      if (event.defaultPrevented || event.altKey || event.ctrlKey || event.metaKey || typingInto(event.target)) return;
      if (/^[1-9]$/.test(event.key)) {
        event.preventDefault();
        latest.current.onNumber(Number(event.key) - 1);
      } else if (event.key === "s" || event.key === "S") {
        if (latest.current.onSkip) { event.preventDefault(); latest.current.onSkip(); }
      } else if (event.key === "u" || event.key === "U") {
        if (latest.current.onUndo) { event.preventDefault(); latest.current.onUndo(); }
      }
    }
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, []);
}
