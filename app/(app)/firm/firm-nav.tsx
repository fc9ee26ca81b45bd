import { Link } from "@/components/shell/link";

const TABS = [
  { href: "/firm", label: "Overview" },
  { href: "/firm/members", label: "Members" },
  { href: "/firm/invitations", label: "Invitations" },
  { href: "/firm/tokens", label: "API tokens" },
  { href: "/firm/billing", label: "Billing" },
] as const;

/** Tabs between the firm pages; the admin-only ones are shown to admins only. */
export function FirmNav({ current, isAdmin }: { current: (typeof TABS)[number]["href"]; isAdmin: boolean }) {
  const tabs = isAdmin ? TABS : TABS.slice(0, 1);
  return (
    <nav aria-label="Firm" className="flex gap-1 border-b border-line">
      {tabs.map((t) => (
        <Link
          key={t.href}
          href={t.href}
          aria-current={t.href === current ? "page" : undefined}
          className="-mb-px border-b-2 border-transparent px-3 py-2 text-small font-medium text-muted hover:text-ink aria-[current=page]:border-accent aria-[current=page]:text-ink"
        >
          {t.label}
        </Link>
      ))}
    </nav>
  );
}
