import "server-only";
import bcrypt from "bcryptjs";

const COST = 12;
// Compared against when the account does not exist, so a wrong e-mail costs as long as a wrong
// password and response times do not reveal which addresses have accounts.
const DUMMY_HASH = bcrypt.hashSync("filmsheet-no-such-account", COST);

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, COST);
}

export async function verifyPassword(password: string, hash: string | null | undefined): Promise<boolean> {
  const ok = await bcrypt.compare(password, hash ?? DUMMY_HASH);
  return ok && hash !== null && hash !== undefined;
}
