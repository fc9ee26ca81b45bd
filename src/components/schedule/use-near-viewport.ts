"use client";

import { useEffect, useState, type RefObject } from "react";

/**
 * Whether an element is on screen or within `margin` of it (an IntersectionObserver, which also
 * follows scrolling panels), and true from the moment the page is printed. Lets a part of the page
 * below the fold (the zone chart) be drawn only when it is about to be seen, and not be redrawn
 * while it is off screen.
 */
export function useNearViewport(ref: RefObject<HTMLElement | null>, margin = "0px"): boolean {
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
    const observer = new IntersectionObserver((entries) => setNear(entries[entries.length - 1]!.isIntersecting), { rootMargin: margin });
    observer.observe(el);
    return () => {
      observer.disconnect();
      window.removeEventListener("beforeprint", printing);
    };
  }, [ref, margin]);
  return near;
}
