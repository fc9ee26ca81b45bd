// The PDF of an invoice, as Stripe links one from every finalised invoice (`invoice_pdf`): a plain
// one-page document drawn with jsPDF, saying plainly that the stand-in issued it.
import { jsPDF } from "jspdf";
import type { StripeObject } from "./store";

const money = (minor: unknown, currency: unknown) =>
  new Intl.NumberFormat("en-GB", { style: "currency", currency: String(currency ?? "gbp").toUpperCase() }).format(Number(minor ?? 0) / 100);
const day = (seconds: unknown) => new Date(Number(seconds ?? 0) * 1000).toISOString().slice(0, 10);

/** One invoice as PDF bytes. */
export function invoicePdf(invoice: StripeObject): Buffer {
  const doc = new jsPDF({ unit: "mm", format: "a4" });
  doc.setFont("helvetica", "bold").setFontSize(18).text(`Invoice ${String(invoice.number ?? invoice.id)}`, 20, 28);
  doc.setFont("helvetica", "normal").setFontSize(10);
  doc.text("Issued by the local Stripe stand-in in test mode: not a tax invoice, nothing was charged.", 20, 36);
  const rows: [string, string][] = [
    ["Billed to", String(invoice.customer_email ?? invoice.customer ?? "")],
    ["Date", day(invoice.created)],
    ["Period", `${day(invoice.period_start)} to ${day(invoice.period_end)}`],
    ["Status", String(invoice.status ?? "")],
  ];
  let y = 50;
  for (const [k, v] of rows) {
    doc.setTextColor(90).text(k, 20, y).setTextColor(0).text(v, 60, y);
    y += 7;
  }
  y += 6;
  doc.setFont("helvetica", "bold").text("Description", 20, y).text("Amount", 190, y, { align: "right" });
  doc.setFont("helvetica", "normal");
  const lines = ((invoice.lines as { data?: { description?: string; amount?: number }[] } | undefined)?.data ?? []);
  for (const line of lines) {
    y += 7;
    doc.text(String(line.description ?? ""), 20, y).text(money(line.amount, invoice.currency), 190, y, { align: "right" });
  }
  y += 10;
  doc.setFont("helvetica", "bold").text("Total", 20, y).text(money(invoice.total, invoice.currency), 190, y, { align: "right" });
  doc.setFont("helvetica", "normal").text(`Amount paid ${money(invoice.amount_paid, invoice.currency)}; due ${money(invoice.amount_remaining, invoice.currency)}`, 20, y + 8);
  return Buffer.from(doc.output("arraybuffer"));
}
