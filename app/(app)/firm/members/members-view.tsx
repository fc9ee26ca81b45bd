import { PageHeader, Panel } from "@/components/panel";
import type { TMember } from "@/server/services/list-members";
import type { SeatUsage } from "@/server/repositories/firms";
import { AdminOnly } from "../admin-only";
import { FirmNav } from "../firm-nav";
import { SeatMeter } from "../seat-meter";
import { InviteForm } from "./invite-form";
import { MemberRow } from "./member-row";

export function MembersView({ firmName, me, data }: { firmName: string; me: number | null; data: { members: TMember[]; seats: SeatUsage } | null }) {
  return (
    <div className="grid gap-6">
      <PageHeader title="Members" lead={`The people of ${firmName} and what each may do. A person may hold several roles.`} />
      <FirmNav current="/firm/members" isAdmin={data !== null} />
      {data === null ? (
        <AdminOnly />
      ) : (
        <>
          <Panel title="Invite a colleague" lead="They get an e-mail with a link that works for 7 days.">
            <div className="grid gap-5">
              <SeatMeter seats={data.seats} />
              <InviteForm full={data.seats.used >= data.seats.bought} />
            </div>
          </Panel>
          <Panel title="Members" lead={`${data.members.length} ${data.members.length === 1 ? "person" : "people"}`}>
            <ul className="divide-y divide-line">
              {data.members.map((m) => (
                <MemberRow key={m.id} member={m} isMe={m.id === me} />
              ))}
            </ul>
          </Panel>
        </>
      )}
    </div>
  );
}
