// The stand-in's state: Stripe-shaped objects by id, kept in memory and, when a file is given
// (npm start passes .data/stripe-stand-in.json), written after every change so that a restart
// keeps the customers and subscriptions the app's database refers to.
import { randomBytes } from "node:crypto";
import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import { dirname } from "node:path";

export type StripeObject = Record<string, unknown> & { id: string; object: string };

/** The one price the app sells: a seat, monthly, in pounds (an invented Filmsheet list price). */
export const SEAT_PRICE: StripeObject = {
  id: "price_filmsheet_seat_monthly",
  object: "price",
  active: true,
  currency: "gbp",
  unit_amount: 2900,
  nickname: "Filmsheet seat",
  product: "prod_filmsheet_seat",
  recurring: { interval: "month", interval_count: 1, usage_type: "licensed" },
  type: "recurring",
  livemode: false,
};

export interface StandInState {
  customers: Record<string, StripeObject>;
  prices: Record<string, StripeObject>;
  checkoutSessions: Record<string, StripeObject>;
  portalSessions: Record<string, StripeObject>;
  subscriptions: Record<string, StripeObject>;
  invoices: Record<string, StripeObject>;
  /** Every event in the order it happened. */
  events: StripeObject[];
  invoiceSeq: number;
}

export interface Delivery {
  eventId: string;
  type: string;
  attempt: number;
  status: number | null;
  error?: string;
  at: string;
}

const empty = (): StandInState => ({
  customers: {},
  prices: { [SEAT_PRICE.id]: SEAT_PRICE },
  checkoutSessions: {},
  portalSessions: {},
  subscriptions: {},
  invoices: {},
  events: [],
  invoiceSeq: 0,
});

export class Store {
  state: StandInState;
  /** Webhook deliveries of this run (not persisted): what tests and people inspect. */
  readonly deliveries: Delivery[] = [];

  constructor(private readonly file?: string) {
    this.state = file && existsSync(file) ? { ...empty(), ...(JSON.parse(readFileSync(file, "utf8")) as StandInState) } : empty();
  }

  /** Writes the state atomically (rename), so a crash never leaves half a file. */
  save(): void {
    if (!this.file) return;
    mkdirSync(dirname(this.file), { recursive: true });
    const tmp = `${this.file}.tmp`;
    writeFileSync(tmp, JSON.stringify(this.state));
    renameSync(tmp, this.file);
  }
}

/** Stripe-like ids: a prefix and 24 random characters. */
export function newId(prefix: string): string {
  return `${prefix}_${randomBytes(18).toString("base64url").replace(/[-_]/g, "x").slice(0, 24)}`;
}

/** Seconds since the epoch, as Stripe's timestamps are. */
export const nowSeconds = (): number => Math.floor(Date.now() / 1000);

/** One calendar month on from a timestamp (Stripe bills monthly on the same day). */
export function addMonth(seconds: number): number {
  const d = new Date(seconds * 1000);
  d.setUTCMonth(d.getUTCMonth() + 1);
  return Math.floor(d.getTime() / 1000);
}
