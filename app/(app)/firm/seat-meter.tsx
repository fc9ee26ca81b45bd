import type { SeatUsage } from "@/server/repositories/firms";

/** Seats in use (members plus pending invitations) against the seats bought. */
export function SeatMeter({ seats }: { seats: SeatUsage }) {
  const full = seats.used >= seats.bought;
  const pct = (n: number) => `${Math.min(100, (n / Math.max(seats.bought, 1)) * 100)}%`;
  return (
    <div className="grid gap-2" aria-label="Seats">
      <p className="text-small">
        <strong className="text-title tabular">{seats.used}</strong> <span className="text-muted">of {seats.bought} seats in use</span>
        <span className="text-muted"> · {seats.members} {seats.members === 1 ? "member" : "members"}, {seats.pending} pending</span>
      </p>
      <div className="relative h-2 overflow-hidden rounded-full bg-sunken" role="meter" aria-valuemin={0} aria-valuemax={seats.bought} aria-valuenow={seats.used} aria-label="Seats in use">
        <div className="absolute inset-y-0 left-0 bg-accent/40" style={{ width: pct(seats.used) }} />
        <div className="absolute inset-y-0 left-0 bg-accent" style={{ width: pct(seats.members) }} />
      </div>
      {full ? <p className="text-small text-caution">Every seat is taken: buy more seats, or revoke a pending invitation, before inviting anyone else.</p> : null}
    </div>
  );
}
