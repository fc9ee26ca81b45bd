"use client";

import { startTransition, useEffect, useState } from "react";

/**
 * `value`, but only after the browser has painted the frame that shows the render which gave it:
 * null on the first render, then each new value a frame later (a timer set in the next animation
 * frame runs after that frame's paint), as an interruptible transition. For work that must not
 * stand between a keystroke and its result on screen — useDeferredValue renders in the task right
 * after the urgent one, often before the browser has painted it.
 */
/**
 * Resolves after the browser has painted its next frame (a timer set in the next animation frame),
 * or after 50 ms when no frame comes (a hidden tab runs no animation frames).
 */
export function afterNextPaint(): Promise<void> {
  return new Promise((resolve) => {
    const fallback = setTimeout(resolve, 50);
    requestAnimationFrame(() => {
      clearTimeout(fallback);
      setTimeout(resolve);
    });
  });
}

export function useAfterPaint<T>(value: T): T | null {
  const [shown, setShown] = useState<T | null>(null);
  useEffect(() => {
    let live = true;
    void afterNextPaint().then(() => {
      if (live) startTransition(() => setShown(value));
    });
    return () => {
      live = false;
    };
  }, [value]);
  return shown;
}
