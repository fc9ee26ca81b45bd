"use client";

import { useLayoutEffect, useState, type RefObject } from "react";

/**
 * The height that takes an element from where it starts down to the bottom of the window, less
 * `below` px (what must stay visible under it), and never under `min` px. Measured against the
 * page, not the scroll position, and again whenever anything on the page changes size (a notice
 * above, a wrapped toolbar, the window itself). Its own height never moves its top, so the
 * measurement settles at once.
 */
export function useFillHeight(ref: RefObject<HTMLElement | null>, below: number, min = 320): number | undefined {
  const [height, setHeight] = useState<number>();
  useLayoutEffect(() => {
    const measure = () => {
      const el = ref.current;
      if (!el) return;
      const top = el.getBoundingClientRect().top + window.scrollY;
      setHeight(Math.max(min, Math.floor(window.innerHeight - top - below)));
    };
    measure();
    const observer = new ResizeObserver(measure);
    observer.observe(document.body);
    window.addEventListener("resize", measure);
    return () => {
      observer.disconnect();
      window.removeEventListener("resize", measure);
    };
  }, [ref, below, min]);
  return height;
}
