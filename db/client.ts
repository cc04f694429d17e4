// The one database client of the server. Everything that reads or writes SQL goes through `db`.
import "server-only";
import { drizzle } from "drizzle-orm/postgres-js";
import postgres from "postgres";
import { env } from "@/lib/env";
import * as schema from "./schema";

// Reuse one pool across hot reloads in development.
const globalForDb = globalThis as unknown as { ribbonrySql?: postgres.Sql };

export const sql =
  globalForDb.ribbonrySql ?? postgres(env.DATABASE_URL, { max: 10, onnotice: () => {} });
if (env.NODE_ENV !== "production") globalForDb.ribbonrySql = sql;

export const db = drizzle(sql, { schema, casing: "snake_case" });
export type Db = typeof db;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
