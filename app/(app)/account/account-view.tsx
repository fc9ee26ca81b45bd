import { PageHeader, Panel } from "@/components/panel";
import { signOutEverywhereAction } from "./actions";

export function AccountView({ user, sessions, confirmed }: { user: { name: string | null; email: string }; sessions: number; confirmed: boolean }) {
  return (
    <div className="grid gap-6">
      <PageHeader title="Account" lead={`${user.name ?? user.email} · ${user.email}`} />
      {confirmed ? null : (
        <Panel title="Your address is not confirmed yet">
          <p className="max-w-prose text-small text-muted">
            Follow the link in the e-mail we sent when you signed up, while signed in here. Until then, the first sign-in with an e-mailed link
            to {user.email} clears this account&apos;s password (in case someone else signed up with your address); you can then choose a new one with
            “Forgot your password?”.
          </p>
        </Panel>
      )}
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
