"use client";

import { useEffect, useRef, useState } from "react";

export interface ExportItem {
  label: string;
  href: string;
}

/**
 * The export menu: a button and a list of download links. It closes on Escape (focus back on the
 * button), on a click or tap outside it, and once a download has started. The list stays in the
 * page while closed (hidden), so a link clicked as the menu closes still downloads.
 */
export function ExportMenu({ items, buttonClass }: { items: readonly ExportItem[]; buttonClass: string }) {
  const [open, setOpen] = useState(false);
  const root = useRef<HTMLDivElement>(null);
  const button = useRef<HTMLButtonElement>(null);

  useEffect(() => {
    if (!open) return;
    const outside = (e: PointerEvent) => {
      if (!root.current?.contains(e.target as Node)) setOpen(false);
    };
    const key = (e: KeyboardEvent) => {
      if (e.key !== "Escape") return;
      setOpen(false);
      button.current?.focus();
    };
    document.addEventListener("pointerdown", outside);
    document.addEventListener("keydown", key);
    return () => {
      document.removeEventListener("pointerdown", outside);
      document.removeEventListener("keydown", key);
    };
  }, [open]);

  return (
    <div ref={root} className="relative">
      <button ref={button} type="button" aria-haspopup="true" aria-expanded={open} aria-controls="export-menu" className={buttonClass} onClick={() => setOpen((v) => !v)}>
        Export ▾
      </button>
      <div id="export-menu" role="group" aria-label="Export" hidden={!open} className="absolute right-0 z-10 mt-1 grid w-64 gap-1 rounded-chip border border-line bg-surface p-2 text-small shadow-panel">
        {items.map((item) => (
          <a key={item.href} className="rounded px-2 py-1 hover:bg-sunken" href={item.href} download onClick={() => setOpen(false)}>
            {item.label}
          </a>
        ))}
      </div>
    </div>
  );
}
