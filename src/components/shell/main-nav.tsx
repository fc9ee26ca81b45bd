"use client";

import { Link } from "@/components/shell/link";
import { usePathname } from "next/navigation";
import type { ReactNode } from "react";

const icon = (d: string) => (
  <svg viewBox="0 0 20 20" className="size-4 shrink-0" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" aria-hidden="true">
    <path d={d} />
  </svg>
);

const ITEMS: { href: string; label: string; hint: string; icon: ReactNode }[] = [
  { href: "/projects", label: "Projects", hint: "Schedules, zones and revisions", icon: icon("M4 5.5h12M4 10h12M4 14.5h7M2.5 3h15v14h-15z") },
  { href: "/methods", label: "Methods", hint: "Correlations, sources, validity", icon: icon("M3 16c3 0 3.5-12 7-12s3.5 8 7 8M3 16h14") },
  { href: "/firm", label: "Firm", hint: "Members, seats, billing", icon: icon("M3.5 17V7l6.5-4 6.5 4v10M8 17v-4.5h4V17M2 17h16") },
];

/** The main navigation; the current section is marked with aria-current. */
export function MainNav() {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className="flex gap-1 md:flex-col">
      {ITEMS.map((item) => {
        const current = pathname === item.href || pathname.startsWith(`${item.href}/`);
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={current ? "page" : undefined}
            title={item.label}
            className="group flex items-center gap-2.5 rounded-chip border-l-2 border-transparent px-3 py-2 text-small font-medium text-muted hover:bg-sunken hover:text-ink aria-[current=page]:border-accent aria-[current=page]:bg-accent-soft aria-[current=page]:text-ink"
          >
            {item.icon}
            <span className="flex flex-col">
              {item.label}
              <span className="hidden text-micro font-normal text-muted md:block">{item.hint}</span>
            </span>
          </Link>
        );
      })}
    </nav>
  );
}
