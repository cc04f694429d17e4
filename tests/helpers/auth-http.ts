// Calls better-auth the way the route /api/auth/[...all] does (handleAuthRequest), as if each
// request came from a socket at `peer`: the header the server's socket watcher would have written
// (lib/client-address.ts) is set here by hand, since there is no socket in these tests.
import { handleAuthRequest } from "@/lib/auth";
import { PEER_ADDRESS_HEADER, watchPeerAddresses } from "@/lib/client-address";
import { env } from "@/lib/env";

// The watcher must be running for the peer header to count, as in the real server.
watchPeerAddresses();

// Documentation-range addresses (RFC 3849, 2001:db8::/32), a new /48 per test run, so each test
// has rate-limit buckets of its own; nothing is sent to them.
const run = Math.floor(Math.random() * 0xffff).toString(16);
export const peerFor = (n: number) => `2001:db8:${run}:${n.toString(16)}::1`;

export type AuthCall = { body?: unknown; peer: string; cookie?: string; method?: string; forwardedFor?: string };

export async function callAuth(pathAndQuery: string, init: AuthCall): Promise<Response> {
  const headers = new Headers({ origin: env.APP_URL, [PEER_ADDRESS_HEADER]: init.peer });
  if (init.forwardedFor) headers.set("x-forwarded-for", init.forwardedFor);
  if (init.body !== undefined) headers.set("content-type", "application/json");
  if (init.cookie) headers.set("cookie", init.cookie);
  return handleAuthRequest(
    new Request(new URL(`/api/auth${pathAndQuery}`, env.APP_URL), {
      method: init.method ?? (init.body === undefined ? "GET" : "POST"),
      headers,
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
    }),
  );
}

/** The cookies a response sets, as one Cookie header value (expired ones left out). */
export function cookiesFrom(res: Response): string {
  return res.headers
    .getSetCookie()
    .filter((c) => !/max-age=0\b/i.test(c))
    .map((c) => c.split(";")[0])
    .join("; ");
}
