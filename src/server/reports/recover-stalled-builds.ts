import "server-only";
import { db } from "@/server/db/knex";
import { enqueueReportBuild } from "./report-builds";

/**
 * A running build writes its progress at least every few seconds; one silent this long lost its
 * worker (killed, or its machine gone). graphile-worker itself would free the job only after its
 * fixed 4-hour lock, so the workers look for such builds themselves.
 */
export function stallSeconds(): number {
  const raw = Number(process.env.REPORT_STALL_SECONDS);
  return Number.isFinite(raw) && raw >= 1 ? raw : 60;
}

/**
 * Puts every build that stalled mid-way back in the queue, as a new job, and says so on the build
 * (its stage reads "Restarting …", which the page's progress bar shows). One UPDATE picks the rows,
 * so when several workers look at once each build is restarted once. Should the lost job ever be
 * freed and run, it finds the build no longer queued (or done) and leaves it alone.
 * Returns the ids restarted.
 */
export async function recoverStalledBuilds(seconds = stallSeconds()): Promise<string[]> {
  return db().transaction(async (trx) => {
    const rows: { id: string }[] = await trx("report_builds")
      .where({ status: "running" })
      .where("updated_at", "<", trx.raw("now() - make_interval(secs => ?)", [seconds]))
      .update({ status: "queued", progress: 0, stage: "Restarting: the worker building it stopped", updated_at: trx.fn.now() })
      .returning("id");
    for (const { id } of rows) await enqueueReportBuild(trx, id);
    if (rows.length) console.warn(`[jobs] restarted ${rows.length} report build(s) whose worker stopped: ${rows.map((r) => r.id).join(", ")}`);
    return rows.map((r) => r.id);
  });
}
