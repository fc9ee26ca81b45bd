"use client";

import { useRouter } from "next/navigation";
import { useEffect } from "react";

/**
 * Keys on a row's working, as in the check view: A accepts (the check form's Accept), Q goes to
 * the comment a query needs, N opens the next unchecked row. Never while typing in a box.
 */
export function WorkingKeys({ nextHref, canCheck }: { nextHref: string | null; canCheck: boolean }) {
  const router = useRouter();
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const el = e.target as HTMLElement | null;
      if (e.ctrlKey || e.metaKey || e.altKey || (el && (el.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(el.tagName)))) return;
      const form = document.querySelector<HTMLFormElement>('form[aria-label="Check this row"]');
      const k = e.key.toLowerCase();
      if (k === "a" && canCheck && form) form.querySelector<HTMLButtonElement>('button[value="accept"]')?.click();
      else if (k === "q" && canCheck && form?.querySelector('button[value="query"]')) form.querySelector<HTMLTextAreaElement>("textarea")?.focus();
      else if (k === "n" && nextHref) router.push(nextHref);
      else return;
      e.preventDefault();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [canCheck, nextHref, router]);
  return (
    <p className="text-micro text-muted" aria-label="Keyboard">
      Keys: {canCheck ? <><Kbd>A</Kbd> accept · <Kbd>Q</Kbd> write a query · </> : null}
      <Kbd>N</Kbd> next unchecked
    </p>
  );
}

function Kbd({ children }: { children: React.ReactNode }) {
  return <kbd className="rounded border border-line bg-sunken px-1 font-sans text-micro text-ink">{children}</kbd>;
}
