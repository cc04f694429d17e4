// An authenticated JSON route of the app (GET /api/me/entries) under 20 concurrent clients,
// beside the same database query served by a bare node:http server: the cost of the stack.
import http from "node:http";
import type { AddressInfo } from "node:net";
import postgres from "postgres";
import { load, row, type LoadResult } from "./load";

export type StackFloor = { app: LoadResult; bare: LoadResult };

export async function apiVsBare(opts: { appUrl: string; databaseUrl: string; email: string; password: string; durationSec: number }): Promise<StackFloor> {
  const signIn = await fetch(`${opts.appUrl}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: opts.appUrl },
    body: JSON.stringify({ email: opts.email, password: opts.password }),
  });
  if (!signIn.ok) throw new Error(`bench sign-in failed: ${signIn.status} ${await signIn.text()}`);
  const cookie = signIn.headers.getSetCookie().map((c) => c.split(";")[0]).join("; ");
  const me = (await (await fetch(`${opts.appUrl}/api/me`, { headers: { cookie } })).json()) as { id: string };

  const sql = postgres(opts.databaseUrl, { max: 10, onnotice: () => {} });
  // The same select the app's entriesForEntrant makes, without session, framework or ORM.
  const server = http.createServer(async (_req, res) => {
    const rows = await sql`
      select e.id, s.name as "showName", s.slug as "showSlug", e.entry_number as "entryNumber", e.title,
             e.width_um as "widthUm", e.length_um as "lengthUm", e.status
      from entries e join shows s on s.id = e.show_id
      where e.entrant_user_id = ${me.id}
      order by s.show_opens_at desc, e.entry_number asc`;
    res.writeHead(200, { "content-type": "application/json" });
    res.end(JSON.stringify({ entries: rows }));
  });
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  const barePort = (server.address() as AddressInfo).port;
  try {
    // Warm both up so the first JIT and pool connections are not measured.
    await load({ url: `${opts.appUrl}/api/me/entries`, connections: 4, durationSec: 2, headers: { cookie } });
    await load({ url: `http://127.0.0.1:${barePort}/`, connections: 4, durationSec: 1 });
    const app = await load({ url: `${opts.appUrl}/api/me/entries`, connections: 20, durationSec: opts.durationSec, headers: { cookie } });
    const bare = await load({ url: `http://127.0.0.1:${barePort}/`, connections: 20, durationSec: opts.durationSec });
    console.log("\nAuthenticated JSON route vs bare node:http + postgres (20 connections)");
    console.log(row("app  GET /api/me/entries", app));
    console.log(row("bare node:http, same query", bare));
    console.log(`ratio (app / bare): throughput ${(app.requestsPerSec / bare.requestsPerSec).toFixed(2)}×, p95 ${(app.p95Ms / bare.p95Ms).toFixed(2)}×`);
    return { app, bare };
  } finally {
    server.close();
    await sql.end();
  }
}
