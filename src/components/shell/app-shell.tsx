import { Link } from "@/components/shell/link";
import type { ReactNode } from "react";
import { LogoMark } from "@/components/brand/logo-mark";
import { EngineeringCaution } from "@/components/engineering-caution";
import { ContextSwitcher } from "./context-switcher";
import { MainNav } from "./main-nav";
import { ThemeSwitch } from "./theme-switch";
import { UserMenu } from "./user-menu";

export interface ShellViewer {
  user: { name: string | null; email: string };
  firm?: { id: string; name: string };
  firms: { id: string; name: string }[];
}

/** Header (brand, firm switcher, theme, user), navigation rail, content area and footer. */
export function AppShell({
  children,
  viewer,
  signOut,
  switchFirm,
}: {
  children: ReactNode;
  viewer: ShellViewer | null;
  signOut: (form: FormData) => Promise<void>;
  switchFirm: (form: FormData) => Promise<void>;
}) {
  return (
    <div className="flex min-h-dvh flex-col">
      <a href="#content" className="sr-only focus:not-sr-only focus:absolute focus:left-3 focus:top-3 focus:z-10 focus:rounded-chip focus:bg-surface focus:px-3 focus:py-2">
        Skip to content
      </a>
      <header className="print:hidden sticky top-0 z-[5] flex h-bar items-center gap-3 border-b border-line bg-surface/90 px-4 backdrop-blur">
        <Link href="/" className="flex items-center gap-2 font-semibold tracking-tight">
          <LogoMark />
          <span className="text-lead">Filmsheet</span>
        </Link>
        <span className="hidden h-5 w-px bg-line sm:block" aria-hidden="true" />
        <ContextSwitcher firm={viewer?.firm} firms={viewer?.firms ?? []} switchFirm={switchFirm} />
        <div className="ml-auto flex items-center gap-3">
          <ThemeSwitch />
          <UserMenu user={viewer?.user} signOut={signOut} />
        </div>
      </header>
      <div className="flex flex-1 flex-col md:flex-row">
        <aside className="print:hidden border-b border-line px-3 py-2 md:w-rail md:shrink-0 md:border-b-0 md:border-r md:py-4">
          <MainNav />
        </aside>
        <main id="content" className="min-w-0 flex-1 px-gutter py-8">
          <div className="mx-auto max-w-page">{children}</div>
        </main>
      </div>
      <footer className="border-t border-line bg-surface px-gutter py-4">
        <EngineeringCaution className="mx-auto max-w-page" />
      </footer>
    </div>
  );
}
