import { count } from "drizzle-orm";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { databaseFile, openDatabase, type Db } from "@/db/client";
import { migrateDatabase } from "@/db/migrate";
import { clubs } from "@/db/schema";
import { seedFoundation } from "./foundation";
import { seedFleet } from "./fleet";
import { seedSafety } from "./safety";
import { seedMoney } from "./money";
import { seedBookings } from "./bookings";
import { logInfo } from "@/lib/server/log";

export async function seedDemo(db: Db): Promise<void> {
  const foundation = await seedFoundation(db);
  seedFleet(db, foundation);
  seedSafety(db, foundation);
  seedMoney(db, foundation);
  seedBookings(db, foundation);
}

if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  const db = openDatabase();
  migrateDatabase(db);
  const existing = db.select({ n: count() }).from(clubs).get()?.n ?? 0;
  if (existing > 0 && !process.argv.includes("--force")) {
    logInfo("seed", `${databaseFile()} already holds ${existing} clubs; not seeding again (delete the file to start over).`);
  } else {
    await seedDemo(db);
    logInfo("seed", `Seeded the demo scenario into ${databaseFile()}`);
  }
  db.$client.close();
}
