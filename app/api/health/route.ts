// Liveness for scripts and load balancers: answers 200 when the database answers.
import { sql } from "@/db/client";

export async function GET() {
  try {
    await sql`select 1`;
    return Response.json({ ok: true });
  } catch {
    return Response.json({ ok: false, message: "The database does not answer." }, { status: 503 });
  }
}
