// What bench:browser runs inside the page, as plain JavaScript read as text and installed before
// the page's own scripts (a TypeScript loader would add helpers the page does not have). It
// records long tasks, long animation frames and when the first rows and results appear, and
// offers window.__probes for the benchmark's steps.
(() => {
  // firstRow: the first rows on screen, whichever comes first — the server-drawn preview of the
  // sheet (sheet-preview.tsx) or the grid's own rows; firstGridRow: the grid's own (the sheet can
  // be used). Each is the time of the animation frame after the rows are in the document (the
  // frame that paints them; a page not yet allowed to paint runs no frames).
  const b = (window.__bench = { long: [], loaf: [], firstRow: null, firstPreviewRow: null, firstGridRow: null, firstResult: null });
  const observe = (type, into) => {
    try {
      new PerformanceObserver((list) => {
        for (const e of list.getEntries()) into.push({ start: e.startTime, duration: e.duration });
      }).observe({ type, buffered: true });
    } catch {
      // this Chromium does not report that entry type
    }
  };
  observe("longtask", b.long);
  observe("long-animation-frame", b.loaf);
  let waiting = { preview: false, grid: false };
  const painted = (key) => {
    if (waiting[key]) return;
    waiting[key] = true;
    requestAnimationFrame((t) => {
      const now = Math.max(t, performance.now());
      if (key === "preview") b.firstPreviewRow = now;
      else b.firstGridRow = now;
      if (b.firstRow === null || now < b.firstRow) b.firstRow = now;
    });
  };
  const first = new MutationObserver(() => {
    if (!waiting.preview && document.querySelector(".fs-sheet-preview [data-preview-row]")) painted("preview");
    // (.floor-row: the hand-drawn list of bench:browser's floor page.)
    if (!waiting.grid && document.querySelector(".ag-grid-scrolling-rows .ag-row, .floor-row")) painted("grid");
    if (b.firstResult === null) {
      const q = document.querySelector('.ag-grid-scrolling-rows .ag-row [col-id="r:Q_W"]');
      // A number, not the dash a cell shows while its results are on their way.
      if (q && /\d/.test(q.textContent ?? "")) b.firstResult = performance.now();
    }
    if (waiting.grid && b.firstResult !== null) first.disconnect();
  });
  first.observe(document, { subtree: true, childList: true, characterData: true });

  window.__probes = {
    /**
     * Arms a watch for the next `event` (keydown Enter, or change): window.__done resolves with
     * the time from that event to the frame in which every watched element's text has changed.
     */
    armWatch({ event, selectors }) {
      const text = () => selectors.map((s) => document.querySelector(s)?.textContent);
      const before = text();
      if (before.some((t) => t === undefined)) throw new Error(`not on the page: ${selectors.filter((_, i) => before[i] === undefined).join(", ")}`);
      window.__done = new Promise((resolve, reject) => {
        let start = -1;
        const onEvent = (e) => {
          if (event === "keydown" && e.key !== "Enter") return;
          document.removeEventListener(event, onEvent, true);
          start = e.timeStamp;
        };
        document.addEventListener(event, onEvent, true);
        const check = () => {
          // The grid may re-create cells: look them up again each time.
          const now = text();
          if (start >= 0 && now.every((t, i) => t !== undefined && t !== before[i])) {
            mo.disconnect();
            clearTimeout(timer);
            // On screen in the frame after this one.
            requestAnimationFrame(() => resolve(performance.now() - start));
          }
        };
        const mo = new MutationObserver(check);
        mo.observe(document.body, { subtree: true, childList: true, characterData: true });
        const timer = setTimeout(() => {
          mo.disconnect();
          reject(new Error(`no change of ${selectors.join(", ")} within 20 s`));
        }, 20000);
      });
    },
    /** The app's user-timing measures (filmsheet:*) and the longest task and frame since `since`. */
    readSince(since) {
      const measures = performance
        .getEntriesByType("measure")
        .filter((m) => m.name.startsWith("filmsheet:") && m.startTime >= since)
        .map((m) => ({ name: m.name, duration: m.duration }));
      const maxOf = (xs) => Math.max(0, ...xs.filter((x) => x.start >= since).map((x) => x.duration));
      return { measures, longest: maxOf(b.long), longestFrame: maxOf(b.loaf), now: performance.now() };
    },
    /** Scrolls the grid `px` per frame for `frames` frames; resolves with the gaps between frames (ms). */
    fastScroll({ frames, px }) {
      const vp = document.querySelector(".ag-grid-viewport") ?? document.querySelector(".ag-body-viewport") ?? document.querySelector(".floor-viewport");
      return new Promise((resolve) => {
        const gaps = [];
        let last = -1;
        let n = 0;
        const step = (t) => {
          if (last >= 0) gaps.push(t - last);
          last = t;
          if (n++ >= frames) return resolve(gaps);
          vp.scrollTop = vp.scrollTop + px >= vp.scrollHeight - vp.clientHeight ? 0 : vp.scrollTop + px;
          requestAnimationFrame(step);
        };
        requestAnimationFrame(step);
      });
    },
  };
})();
