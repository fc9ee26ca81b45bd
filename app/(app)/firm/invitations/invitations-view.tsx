import { Link } from "@/components/shell/link";
import { PageHeader, Panel } from "@/components/panel";
import type { TInvitationRow } from "@/server/repositories/invitations";
import { AdminOnly } from "../admin-only";
import { FirmNav } from "../firm-nav";
import { InvitationRow } from "./invitation-row";

export function InvitationsView({ invitations }: { invitations: TInvitationRow[] | null }) {
  return (
    <div className="grid gap-6">
      <PageHeader title="Invitations" lead="Invitations not yet accepted. Each holds a seat until it is accepted, revoked or expires." />
      <FirmNav current="/firm/invitations" isAdmin={invitations !== null} />
      {invitations === null ? (
        <AdminOnly />
      ) : (
        <Panel title="Pending invitations" actions={<Link href="/firm/members" className="text-small font-medium text-accent hover:underline">Invite a colleague</Link>}>
          {invitations.length === 0 ? (
            <p className="text-small text-muted">No pending invitations.</p>
          ) : (
            <ul className="divide-y divide-line">
              {invitations.map((i) => (
                <InvitationRow key={i.id} invitation={{ ...i, expires_at: new Date(i.expires_at).toISOString() }} />
              ))}
            </ul>
          )}
        </Panel>
      )}
    </div>
  );
}
