"use client";

import { useEffect, useState, type RefObject } from "react";

/**
 * Whether an element is on screen (an IntersectionObserver, which also follows scrolling panels),
 * and true from the moment the page is printed. Lets a part of the page below the fold (the zone
 * chart) be drawn only when it is seen, and not be redrawn while it is off screen.
 */
export function useNearViewport(ref: RefObject<HTMLElement | null>): boolean {
  const [near, setNear] = useState(false);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const printing = () => setNear(true);
    window.addEventListener("beforeprint", printing);
    if (typeof IntersectionObserver === "undefined") {
      setNear(true);
      return () => window.removeEventListener("beforeprint", printing);
    }
    const observer = new IntersectionObserver((entries) => setNear(entries[entries.length - 1]!.isIntersecting));
    observer.observe(el);
    return () => {
      observer.disconnect();
      window.removeEventListener("beforeprint", printing);
    };
  }, [ref]);
  return near;
}
