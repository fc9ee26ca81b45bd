"use client";

import { useEffect, useState, type RefObject } from "react";

/**
 * The height that takes an element from where it starts down to the bottom of the window, less
 * `below` px (what must stay visible under it), and never under `min` px. Measured against the
 * page, not the scroll position, and again whenever anything on the page changes size (a notice
 * above, a wrapped toolbar, the window itself). Its own height never moves its top, so the
 * measurement settles at once.
 *
 * Measured only in a ResizeObserver's callback, which the browser runs after it has laid the page
 * out: reading the element's place there costs nothing, where reading it during hydration (a
 * layout effect) made the browser lay out the whole freshly hydrated page inside that task
 * (≈ 60 ms of a 5,000-row sheet's load). Until then the caller's fallback height stands.
 */
export function useFillHeight(ref: RefObject<HTMLElement | null>, below: number, min = 320): number | undefined {
  const [height, setHeight] = useState<number>();
  useEffect(() => {
    const measure = () => {
      const el = ref.current;
      if (!el) return;
      const top = el.getBoundingClientRect().top + window.scrollY;
      setHeight(Math.max(min, Math.floor(window.innerHeight - top - below)));
    };
    // Its first callback comes with the next frame's layout; later ones on every size change.
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
