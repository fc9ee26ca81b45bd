import "server-only";
import { randomBytes } from "node:crypto";
import { subscribe } from "node:diagnostics_channel";
import type { IncomingMessage } from "node:http";
import type { Socket } from "node:net";

type Holder = { __filmsheetClientHeader?: string };
const holder = globalThis as Holder;

/**
 * The caller's address from what the socket saw and the X-Forwarded-For chain: with no trusted
 * proxy the socket's peer, with N the Nth hop from the right (each trusted proxy appends the
 * address it received from). Anything further left was written by the client and is ignored.
 */
export function forwardedClient(forwardedFor: string | undefined, socketAddress: string | undefined, trustedProxies: number): string {
  const hops = [...(forwardedFor ?? "").split(","), socketAddress ?? ""].map((h) => h.trim()).filter(Boolean);
  // Fewer hops than proxies: the request skipped some of them, so the leftmost is the best known.
  const hop = hops[Math.max(0, hops.length - 1 - trustedProxies)] ?? "unknown";
  return hop.replace(/^::ffff:/, "").slice(0, 64);
}

/**
 * Route handlers never see the socket, so every request is stamped with its caller's address as
 * it arrives (Node's `http.server.request.start` channel, before Next.js reads the request). The
 * header's name is random per process, so a client cannot send one of its own.
 */
export function installClientAddress(trustedProxies: number): void {
  if (holder.__filmsheetClientHeader) return;
  const header = `x-filmsheet-client-${randomBytes(12).toString("hex")}`;
  holder.__filmsheetClientHeader = header;
  subscribe("http.server.request.start", (message) => {
    const { request, socket } = message as { request: IncomingMessage; socket: Socket };
    const xff = request.headers["x-forwarded-for"];
    request.headers[header] = forwardedClient(Array.isArray(xff) ? xff.join(",") : xff, socket.remoteAddress, trustedProxies);
  });
}

/** The caller's address for the sign-in and link limits; "unknown" before the stamp is installed. */
export function clientAddress(headers: Headers): string {
  const header = holder.__filmsheetClientHeader;
  return (header ? headers.get(header) : null) ?? "unknown";
}
