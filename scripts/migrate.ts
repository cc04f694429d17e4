// `npm run db:migrate`: apply the committed migrations to DATABASE_URL.
import { migrateDatabase } from "../db/migrate";

const url = process.env.DATABASE_URL ?? "postgres://postgres@127.0.0.1:54329/ribbonry";
migrateDatabase(url)
  .then(() => console.log("[ribbonry] migrations applied"))
  .catch((err) => {
    console.error("[ribbonry] migration failed:", err);
    process.exit(1);
  });
