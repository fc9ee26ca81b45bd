// The caller's address for the sign-in limits: the socket's peer unless proxies are trusted,
// then the Nth X-Forwarded-For hop from the right; what the client wrote further left is ignored.
import { describe, expect, test } from "vitest";
import { forwardedClient } from "@/server/auth/client-address";

describe("forwardedClient", () => {
  test("no trusted proxy: the socket, whatever X-Forwarded-For claims", () => {
    expect(forwardedClient("203.0.113.9", "127.0.0.1", 0)).toBe("127.0.0.1");
    expect(forwardedClient(undefined, "::ffff:192.0.2.4", 0)).toBe("192.0.2.4");
  });
  test("one trusted proxy: the hop it appended, not the client's own claims", () => {
    expect(forwardedClient("6.6.6.6, 198.51.100.7", "10.0.0.2", 1)).toBe("198.51.100.7");
  });
  test("two trusted proxies: the second hop from the right", () => {
    expect(forwardedClient("6.6.6.6, 198.51.100.7, 10.0.0.9", "10.0.0.2", 2)).toBe("198.51.100.7");
  });
  test("fewer hops than proxies: the leftmost known", () => {
    expect(forwardedClient(undefined, "10.0.0.2", 1)).toBe("10.0.0.2");
    expect(forwardedClient("", undefined, 0)).toBe("unknown");
  });
});
