// The pages a person sees where Stripe would show its own: the Checkout page (pay for seats)
// and the billing portal (the card, a failed renewal, cancelling). There is no real card here:
// the buttons do what a payment, a decline or a cancellation would, and the app hears of it
// through the same signed webhooks.
import { itemOf } from "./objects";
import type { Store, StripeObject } from "./store";

const esc = (v: unknown) => String(v ?? "").replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
const money = (minor: number, currency: unknown) => `${String(currency).toUpperCase() === "GBP" ? "£" : `${String(currency).toUpperCase()} `}${(minor / 100).toFixed(2)}`;
const day = (seconds: unknown) => new Date(Number(seconds) * 1000).toISOString().slice(0, 10);

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<title>${esc(title)} · local Stripe stand-in</title>
<style>
  :root { color-scheme: light dark; font-family: system-ui, sans-serif; }
  body { margin: 0; background: light-dark(#eef1f4, #14181c); color: light-dark(#1b2228, #e4e9ee); }
  main { max-width: 34rem; margin: 3rem auto; padding: 1.5rem 1.75rem; border-radius: 10px; background: light-dark(#fff, #1e2429); box-shadow: 0 2px 12px #0002; }
  .tag { display: inline-block; font-size: .75rem; padding: .15rem .5rem; border-radius: 99px; background: light-dark(#fde9c8, #4a3817); }
  dl { display: grid; grid-template-columns: auto 1fr; gap: .35rem 1rem; } dt { opacity: .7; } dd { margin: 0; font-variant-numeric: tabular-nums; }
  form { display: inline; } button, a.button { font: inherit; padding: .5rem .9rem; border-radius: 6px; border: 1px solid #7774; cursor: pointer; margin: .25rem .4rem .25rem 0; background: transparent; color: inherit; text-decoration: none; display: inline-block; }
  button.primary { background: #1f6f5c; color: #fff; border-color: #1f6f5c; } button.danger { color: #b3261e; border-color: #b3261e66; }
  p.note { font-size: .85rem; opacity: .75; }
</style></head><body><main><span class="tag">Local Stripe stand-in · test mode · no real money</span>${body}</main></body></html>`;
}

export function checkoutPage(store: Store, session: StripeObject): string {
  const line = (session.line_items as { data: { price: string; quantity: number }[] }).data[0]!;
  const price = store.state.prices[line.price]!;
  const customer = store.state.customers[String(session.customer)];
  const each = Number(price.unit_amount);
  if (session.status !== "open") {
    return page("Checkout", `<h1>This checkout is ${esc(session.status)}</h1><p><a href="${esc(session.success_url)}">Back to the app</a></p>`);
  }
  return page(
    "Checkout",
    `<h1>Subscribe: ${esc(price.nickname)}</h1>
<dl><dt>Customer</dt><dd>${esc(customer?.name)} (${esc(customer?.email)})</dd>
<dt>Seats</dt><dd>${line.quantity}</dd><dt>Price</dt><dd>${money(each, price.currency)} per seat per month</dd>
<dt>Due today</dt><dd><strong>${money(each * line.quantity, price.currency)}</strong></dd><dt>Card</dt><dd>Test card ending 4242</dd></dl>
<form method="post" action="/checkout/${esc(session.id)}/pay"><button class="primary" type="submit">Pay and subscribe</button></form>
${session.cancel_url ? `<a class="button" href="${esc(session.cancel_url)}">Cancel and go back</a>` : ""}
<p class="note">Paying here creates the subscription and sends signed webhooks to the app, as Stripe would.</p>`,
  );
}

export function portalPage(store: Store, portal: StripeObject): string {
  const customer = store.state.customers[String(portal.customer)];
  const subs = Object.values(store.state.subscriptions).filter((s) => s.customer === portal.customer && s.status !== "canceled");
  const rows = subs
    .map((sub) => {
      const item = itemOf(sub);
      const action = (what: string, label: string, tone = "") => `<form method="post" action="/portal/${esc(portal.id)}/${what}/${esc(sub.id)}"><button class="${tone}" type="submit">${label}</button></form>`;
      return `<h2>Subscription</h2><dl><dt>Status</dt><dd>${esc(sub.status)}</dd><dt>Seats</dt><dd>${item.quantity}</dd>
<dt>Price</dt><dd>${money(Number(item.price.unit_amount), item.price.currency)} per seat per month</dd><dt>Renews</dt><dd>${day(item.current_period_end)}</dd></dl>
${sub.status === "past_due" ? action("pay-overdue", "Pay the overdue invoice with a new test card", "primary") : action("fail-renewal", "Simulate a declined renewal")}
${action("cancel", "Cancel the subscription now", "danger")}`;
    })
    .join("");
  return page(
    "Billing portal",
    `<h1>Billing for ${esc(customer?.name)}</h1><dl><dt>E-mail</dt><dd>${esc(customer?.email)}</dd><dt>Payment method</dt><dd>Test card ending 4242</dd></dl>
${rows || "<p>No live subscription.</p>"}
${portal.return_url ? `<p><a class="button" href="${esc(portal.return_url)}">Return to the app</a></p>` : ""}`,
  );
}
