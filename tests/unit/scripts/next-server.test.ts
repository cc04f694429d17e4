// Where the app listens: Next's own default is every network interface, so the scripts always
// pass -H, loopback unless RIBBONRY_HOST names another address.
import { beforeEach, describe, expect, it, vi } from "vitest";

const spawned: string[][] = [];
vi.mock("node:child_process", async (importOriginal) => {
  const actual = await importOriginal<typeof import("node:child_process")>();
  return { ...actual, spawn: vi.fn((_cmd: string, args: string[]) => (spawned.push(args), { on: vi.fn(), kill: vi.fn() })) };
});

const { listenHost, nextServerArgs, serve } = await import("../../../scripts/lib/app");

const hostOf = (args: string[]) => args[args.indexOf("-H") + 1];

describe("the Next server's listening address", () => {
  beforeEach(() => {
    spawned.length = 0;
  });

  it("serve() spawns `next start -p <port> -H 127.0.0.1` by default", () => {
    serve({}, "3000");
    expect(spawned).toHaveLength(1);
    expect(spawned[0]!.slice(1)).toEqual(["start", "-p", "3000", "-H", "127.0.0.1"]);
  });

  it("serve() passes a configured host", () => {
    serve({}, "3000", "0.0.0.0");
    expect(hostOf(spawned[0]!)).toBe("0.0.0.0");
  });

  it("builds `next dev` arguments with loopback by default", () => {
    expect(nextServerArgs("dev", "3000").slice(1)).toEqual(["dev", "-p", "3000", "-H", "127.0.0.1"]);
  });

  it("listens on loopback unless RIBBONRY_HOST is set", () => {
    expect(listenHost({})).toBe("127.0.0.1");
    expect(listenHost({ RIBBONRY_HOST: "" })).toBe("127.0.0.1");
    expect(listenHost({ RIBBONRY_HOST: " 192.168.1.20 " })).toBe("192.168.1.20");
    // A shell's HOST (tcsh exports the machine's name in it) must not open the app to the network.
    expect(listenHost({ HOST: "quilt-laptop" })).toBe("127.0.0.1");
  });
});
