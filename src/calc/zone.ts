/**
 * Zone totals for one design case: heat loss and heat gain through the zone's surfaces and from
 * the duct runs that serve it, in W and W/m² of floor area.
 *
 * Sign conventions: a surface's Q_W is positive for a loss from inside; a duct run's Q_W is the
 * heat gained by the air, so a negative Q_W (air cooling down on its way) is a loss the zone's
 * plant must make good and a positive one (cool supply air warming up) is a gain.
 */
export interface ZoneRowResult {
  source: "surface" | "duct_run";
  Q_W: number;
}

export interface ZoneTotals {
  loss_W: number;
  gain_W: number;
  net_loss_W: number;
  loss_W_m2: number | null;
  gain_W_m2: number | null;
  surfaces_loss_W: number;
  surfaces_gain_W: number;
  ducts_loss_W: number;
  ducts_gain_W: number;
  rows: number;
}

export function zoneTotals(rows: readonly ZoneRowResult[], floorArea_m2: number): ZoneTotals {
  let sl = 0;
  let sg = 0;
  let dl = 0;
  let dg = 0;
  for (const r of rows) {
    if (!Number.isFinite(r.Q_W)) continue;
    if (r.source === "surface") {
      if (r.Q_W >= 0) sl += r.Q_W;
      else sg -= r.Q_W;
    } else if (r.Q_W <= 0) dl -= r.Q_W;
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
    rows: rows.length,
  };
}
