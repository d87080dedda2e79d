import { defineConfig } from "drizzle-kit";

// `npm run db:generate` writes SQL into db/migrations; review it before committing
// (a table rebuild, `__new_<table>`, copies and drops the old table).
// `db:migrate` applies it through db/migrate.ts, never `drizzle-kit push`.
export default defineConfig({
  dialect: "sqlite",
  schema: "./db/schema.ts",
  out: "./db/migrations",
  dbCredentials: { url: process.env.DATABASE_URL ?? "file:./data/warmstead.db" },
  strict: true,
  verbose: true,
});
