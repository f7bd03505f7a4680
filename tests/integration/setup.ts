// Runs before every integration test file: a fresh, migrated SQLite file of its own, and the
// framework's request-bound functions replaced by stand-ins the tests can observe.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, vi } from "vitest";

const dir = fs.mkdtempSync(path.join(os.tmpdir(), "hangarline-it-"));
process.env.DATABASE_URL = path.join(dir, "test.db");
process.env.OUTBOX_WORKER = "off";
process.env.APP_URL = "http://app.test";
process.env.AUTH_URL = "http://app.test";
process.env.UPLOAD_DIR = path.join(dir, "uploads");

const session = vi.hoisted(() => ({ user: null as null | { id: string; email: string; name: string | null; platformRole: "operator" | null } }));
(globalThis as unknown as { __testSession: typeof session }).__testSession = session;

vi.mock("@/lib/server/session", () => ({
  getSessionUser: async () => session.user,
}));

vi.mock("@/lib/email/runner", () => ({ kickOutbox: () => undefined, startOutboxWorker: () => undefined }));

vi.mock("next/cache", () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));

vi.mock("next/navigation", () => {
  class RedirectSignal extends Error {
    constructor(readonly url: string) {
      super(`redirect:${url}`);
    }
  }
  class NotFoundSignal extends Error {}
  return {
    redirect: (url: string) => {
      throw new RedirectSignal(url);
    },
    notFound: () => {
      throw new NotFoundSignal("not found");
    },
    RedirectSignal,
    NotFoundSignal,
  };
});

const { getDb, closeDb } = await import("@/db/client");
const { migrateDatabase } = await import("@/db/migrate");
migrateDatabase(getDb());

afterAll(() => {
  closeDb();
  fs.rmSync(dir, { recursive: true, force: true });
});
