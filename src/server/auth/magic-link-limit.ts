import "server-only";
import { db } from "@/server/db/knex";

/**
 * Sign-in link requests per hour: per address asked for (a mailbox is no target) and per
 * requesting address (one place cannot fill many mailboxes). Every request counts, sent or not.
 */
export const MAGIC_LINK_LIMITS = { windowMinutes: 60, perEmail: 5, perAddress: 20 } as const;

/** Records one request and says whether it is within both limits (counting itself). */
export async function allowMagicLinkRequest(email: string, address: string): Promise<boolean> {
  const row = { email: email.slice(0, 255), address: address.slice(0, 64) };
  const [mine] = await db()("magic_link_requests").insert(row).returning<{ id: string }[]>("id");
  // Counted after inserting: requests at the same moment see each other, so none slips through.
  const { rows } = await db().raw<{ rows: { by_email: string; by_address: string }[] }>(
    `SELECT count(*) FILTER (WHERE email = :email) AS by_email, count(*) FILTER (WHERE address = :address) AS by_address
       FROM magic_link_requests
      WHERE (email = :email OR address = :address) AND id <= :id AND created_at > now() - make_interval(mins => :minutes)`,
    { ...row, id: mine!.id, minutes: MAGIC_LINK_LIMITS.windowMinutes },
  );
  const counts = rows[0]!;
  return Number(counts.by_email) <= MAGIC_LINK_LIMITS.perEmail && Number(counts.by_address) <= MAGIC_LINK_LIMITS.perAddress;
}
