"use client";

import { useEffect, useState } from "react";
import { THEMES, THEME_STORAGE_KEY, applyTheme, type Theme } from "./theme";

const LABELS: Record<Theme, string> = { system: "Auto", light: "Light", dark: "Dark" };

/** Three-way switch: follow the system, or force light or dark. */
export function ThemeSwitch() {
  const [theme, setTheme] = useState<Theme>("system");

  useEffect(() => {
    const stored = localStorage.getItem(THEME_STORAGE_KEY);
    if (stored === "light" || stored === "dark") setTheme(stored);
  }, []);

  return (
    <div role="group" aria-label="Colour theme" className="flex rounded-chip border border-line bg-sunken p-0.5 text-micro">
      {THEMES.map((t) => (
        <button
          key={t}
          type="button"
          aria-pressed={theme === t}
          onClick={() => {
            applyTheme(t);
            setTheme(t);
          }}
          className="rounded-[0.3rem] px-2 py-0.5 font-medium text-muted transition-colors hover:text-ink aria-pressed:bg-surface aria-pressed:text-ink aria-pressed:shadow-panel"
        >
          {LABELS[t]}
        </button>
      ))}
    </div>
  );
}
