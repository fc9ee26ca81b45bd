import { Link } from "@/components/shell/link";
import { PageHeader, Panel } from "@/components/panel";
import { ROLE_HINTS, ROLE_LABELS } from "@/schemas/roles";
import type { Actor } from "@/server/auth/actor";
import type { SeatUsage } from "@/server/repositories/firms";
import { FirmNav } from "./firm-nav";
import { SeatMeter } from "./seat-meter";

export function FirmView({ actor, seats, isAdmin }: { actor: Actor; seats: SeatUsage; isAdmin: boolean }) {
  return (
    <div className="grid gap-6">
      <PageHeader title={actor.firm.name} lead="Members and their roles, seats, API tokens and the firm's calculation defaults." />
      <FirmNav current="/firm" isAdmin={isAdmin} />
      <div className="grid gap-6 lg:grid-cols-2">
        <Panel title="Your roles here">
          <ul className="grid gap-2">
            {actor.roles.map((r) => (
              <li key={r} className="flex items-baseline gap-2">
                <span className="rounded-chip bg-accent-soft px-2 py-0.5 text-small font-medium">{ROLE_LABELS[r]}</span>
                <span className="text-small text-muted">{ROLE_HINTS[r]}</span>
              </li>
            ))}
          </ul>
          {!isAdmin ? <p className="mt-4 text-small text-muted">A firm admin invites members, sets their roles and manages seats and API tokens.</p> : null}
        </Panel>
        <Panel title="Seats" lead="Every member and every pending invitation takes a seat." actions={isAdmin ? <Link href="/firm/members" className="text-small font-medium text-accent hover:underline">Invite a colleague</Link> : undefined}>
          <SeatMeter seats={seats} />
        </Panel>
      </div>
    </div>
  );
}
