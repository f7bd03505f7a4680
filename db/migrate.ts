import { migrate } from "drizzle-orm/better-sqlite3/migrator";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { databaseFile, openDatabase, type Db } from "./client";
import { logInfo } from "../lib/server/log";

const here = path.dirname(fileURLToPath(import.meta.url));
export const MIGRATIONS_FOLDER = path.join(here, "migrations");

export function migrateDatabase(db: Db): void {
  migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
}

if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  const db = openDatabase();
  migrateDatabase(db);
  db.$client.close();
  logInfo("migrate", `Migrated ${databaseFile()}`);
}
