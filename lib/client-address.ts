// Which network address a request to better-auth comes from: the key of its per-address rate
// limits and the address recorded on a session. Forwarded headers count only from proxies the
// configuration says are there (TRUSTED_PROXY_HOPS); by default none, and the socket decides.
//
// Why a header of our own: a route handler never sees the socket. Next's server copies the
// socket's address into X-Forwarded-For only when the request has no such header (`??=` in
// next/dist/server/base-server.js, Next 16), so a client that sends its own X-Forwarded-For
// chooses its rate-limit bucket. `watchPeerAddresses()` (run once at server start by
// instrumentation.ts) listens on Node's `http.server.request.start` diagnostics channel, which
// fires before the server's request handler, and writes the socket's address into
// PEER_ADDRESS_HEADER, overwriting anything a client sent under that name. `withClientAddress`
// then reads that header only in a process where the watcher runs, so a server without it
// falls back to "address unknown" (one shared bucket) rather than to a header a client chose.
import "server-only";
import { subscribe } from "node:diagnostics_channel";
import type { IncomingMessage } from "node:http";
import type { Socket } from "node:net";

export const PEER_ADDRESS_HEADER = "x-ribbonry-peer-address";
/** The one header better-auth reads the client's address from (`advanced.ipAddress`). */
export const CLIENT_ADDRESS_HEADER = "x-ribbonry-client-address";

// On globalThis, because instrumentation.ts and the route handlers are separate bundles with
// separate copies of this module.
const WATCHING = Symbol.for("ribbonry.peer-address-watcher");
const state = globalThis as typeof globalThis & { [WATCHING]?: boolean };

export function watchPeerAddresses(): void {
  if (state[WATCHING]) return;
  subscribe("http.server.request.start", (message) => {
    const { request, socket } = message as { request: IncomingMessage; socket: Socket };
    request.headers[PEER_ADDRESS_HEADER] = socket.remoteAddress ?? "";
  });
  state[WATCHING] = true;
}

/**
 * The client's address, or null when it cannot be known. With `trustedHops` proxies in front,
 * each appending the address it received from to X-Forwarded-For, the client is the entry that
 * many places from the right; entries further left were written by the client and are ignored.
 * This assumes the app is reachable only through those proxies.
 */
export function clientAddress(headers: Headers, trustedHops: number): string | null {
  if (trustedHops > 0) {
    const chain = (headers.get("x-forwarded-for") ?? "")
      .split(",")
      .map((part) => part.trim())
      .filter(Boolean);
    return chain.length >= trustedHops ? chain[chain.length - trustedHops]! : null;
  }
  if (!state[WATCHING]) return null;
  return headers.get(PEER_ADDRESS_HEADER) || null;
}

/** The request with CLIENT_ADDRESS_HEADER set from `clientAddress` (or removed when unknown). */
export function withClientAddress(request: Request, trustedHops: number): Request {
  const address = clientAddress(request.headers, trustedHops);
  const headers = new Headers(request.headers);
  headers.delete(CLIENT_ADDRESS_HEADER);
  headers.delete(PEER_ADDRESS_HEADER);
  if (address) headers.set(CLIENT_ADDRESS_HEADER, address);
  return new Request(request, { headers });
}
