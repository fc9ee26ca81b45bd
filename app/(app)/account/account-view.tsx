import { PageHeader, Panel } from "@/components/panel";
import { signOutEverywhereAction } from "./actions";

export function AccountView({ user, sessions }: { user: { name: string | null; email: string }; sessions: number }) {
  return (
    <div className="grid gap-6">
      <PageHeader title="Account" lead={`${user.name ?? user.email} · ${user.email}`} />
      <Panel
        title="Where you are signed in"
        lead={sessions === 1 ? "Signed in on this browser only." : `Signed in on ${sessions} browsers or devices, this one included.`}
      >
        <p className="mb-3 max-w-prose text-small text-muted">
          Lost a laptop, or signed in on a shared computer? Signing out everywhere ends every session of your account at once, this one too; a
          copied session cookie stops working as well. API tokens belong to the firm and are not affected.
        </p>
        <form action={signOutEverywhereAction}>
          <button type="submit" className="rounded-chip border border-line px-3 py-2 text-small font-medium hover:bg-sunken">
            Sign out everywhere
          </button>
        </form>
      </Panel>
    </div>
  );
}
