/**
 * Zone totals for one design case: heat loss and heat gain through the zone's surfaces and from
 * the duct runs that serve it, in W and W/m² of floor area.
 *
 * Sign conventions: a surface's Q_W is positive for a loss from inside; a duct run's Q_W is the
 * heat gained by the air, so a negative Q_W (air cooling down on its way) is a loss the zone's
 * plant must make good and a positive one (cool supply air warming up) is a gain.
 *
 * Ducts are split by where they run (v2): a run crossing unconditioned or outdoor space gives or
 * takes heat from a space it does not serve, a distribution loss or gain that is its own line;
 * a run inside the zone it serves releases its heat into that zone, so it adds nothing to the
 * zone's loss or gain and is reported only for reference (`ducts_in_zone_W`).
 */
export interface ZoneRowResult {
  source: "surface" | "duct_run";
  Q_W: number;
  /** Duct runs only: the run lies inside the zone it serves. */
  in_zone?: boolean;
}

export interface ZoneTotals {
  loss_W: number;
  gain_W: number;
  net_loss_W: number;
  loss_W_m2: number | null;
  gain_W_m2: number | null;
  surfaces_loss_W: number;
  surfaces_gain_W: number;
  /** Distribution loss and gain: duct runs crossing unconditioned or outdoor space. */
  ducts_loss_W: number;
  ducts_gain_W: number;
  /** Heat duct runs inside the zone they serve give to it (negative: take from it); not in the totals. */
  ducts_in_zone_W: number;
  rows: number;
}

export function zoneTotals(rows: readonly ZoneRowResult[], floorArea_m2: number): ZoneTotals {
  let sl = 0;
  let sg = 0;
  let dl = 0;
  let dg = 0;
  let inZone = 0;
  for (const r of rows) {
    if (!Number.isFinite(r.Q_W)) continue;
    if (r.source === "surface") {
      if (r.Q_W >= 0) sl += r.Q_W;
      else sg -= r.Q_W;
    } else if (r.in_zone === true) inZone -= r.Q_W;
    else if (r.Q_W <= 0) dl -= r.Q_W;
    else dg += r.Q_W;
  }
  const loss = sl + dl;
  const gain = sg + dg;
  const perArea = (v: number) => (floorArea_m2 > 0 ? v / floorArea_m2 : null);
  return {
    loss_W: loss,
    gain_W: gain,
    net_loss_W: loss - gain,
    loss_W_m2: perArea(loss),
    gain_W_m2: perArea(gain),
    surfaces_loss_W: sl,
    surfaces_gain_W: sg,
    ducts_loss_W: dl,
    ducts_gain_W: dg,
    ducts_in_zone_W: inZone,
    rows: rows.length,
  };
}
