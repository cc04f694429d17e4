// Which address a request counts as coming from (lib/client-address.ts): the socket's, unless the
// configuration names proxies in front; never a header the client wrote (OWASP ASVS 4.0 §2.2.1:
// rate limits a client cannot step around).
import http from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { CLIENT_ADDRESS_HEADER, PEER_ADDRESS_HEADER, clientAddress, watchPeerAddresses, withClientAddress } from "@/lib/client-address";

describe("the socket's address", () => {
  let server: http.Server;
  let url: string;
  beforeAll(async () => {
    watchPeerAddresses();
    server = http.createServer((req, res) => res.end(JSON.stringify(req.headers)));
    await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
    url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/`;
  });
  afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

  it("is written over whatever the client sent under the same name", async () => {
    const res = await fetch(url, { headers: { [PEER_ADDRESS_HEADER]: "203.0.113.9", "x-forwarded-for": "203.0.113.10" } });
    const seen = (await res.json()) as Record<string, string>;
    expect(seen[PEER_ADDRESS_HEADER]).toBe("127.0.0.1");
    expect(clientAddress(new Headers(seen), 0)).toBe("127.0.0.1");
  });
});

describe("forwarded addresses", () => {
  const h = (xff: string) => new Headers({ "x-forwarded-for": xff, [PEER_ADDRESS_HEADER]: "10.0.0.2" });

  it("are ignored when no proxy is configured", () => {
    watchPeerAddresses();
    expect(clientAddress(h("198.51.100.7"), 0)).toBe("10.0.0.2");
  });

  it("count from the right, one entry per trusted proxy; what the client wrote on the left is ignored", () => {
    expect(clientAddress(h("203.0.113.66, 198.51.100.7"), 1)).toBe("198.51.100.7");
    expect(clientAddress(h("203.0.113.66, 198.51.100.7, 10.0.0.5"), 2)).toBe("198.51.100.7");
    // Fewer entries than proxies: the request did not come through them; the address is unknown.
    expect(clientAddress(h("198.51.100.7"), 2)).toBeNull();
  });

  it("reach better-auth only through our own header, never one the client set", () => {
    const request = new Request("http://localhost/api/auth/sign-in/email", {
      headers: { [CLIENT_ADDRESS_HEADER]: "203.0.113.66", [PEER_ADDRESS_HEADER]: "10.0.0.2" },
    });
    expect(withClientAddress(request, 0).headers.get(CLIENT_ADDRESS_HEADER)).toBe("10.0.0.2");
    const viaProxy = new Request("http://localhost/", { headers: { [CLIENT_ADDRESS_HEADER]: "203.0.113.66" } });
    expect(withClientAddress(viaProxy, 1).headers.get(CLIENT_ADDRESS_HEADER)).toBeNull();
  });
});
