// A failing query's SQL parameters (here an e-mail address and a name) never reach the log: not
// through the log helper, not through a bare console.error once the scrubber is installed (what
// the framework itself calls for an uncaught error).
import { inspect } from "node:util";
import { DrizzleQueryError } from "drizzle-orm";
import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { users } from "@/db/schema";
import { describeError, installConsoleScrubber, logError, logWarn, scrubText } from "@/lib/server/log";
import { db, seedOnce } from "./helpers";

const EMAIL = "member@hangarline.test"; // a seeded member: the insert below fails on the unique address
const NAME = "Quillon Vantreese";

/**
 * The real failing insert, wrapped the way drizzle wraps a driver error on its async path
 * (sqlite-core/session.js queryWithCache: `new DrizzleQueryError(sql, params, cause)`), whose
 * message is the SQL and its parameters. The synchronous better-sqlite3 path throws the
 * SqliteError itself; both are covered here.
 */
function failingQuery(): DrizzleQueryError {
  const insert = db().insert(users).values({ email: EMAIL, name: NAME });
  const { sql: statement, params } = insert.toSQL();
  try {
    insert.run();
  } catch (error) {
    return new DrizzleQueryError(statement, params, error as Error);
  }
  throw new Error("the duplicate insert did not fail");
}

function captured(spy: { mock: { calls: unknown[][] } }): string {
  return spy.mock.calls.map((args) => args.map((a) => (typeof a === "string" ? a : inspect(a))).join(" ")).join("\n");
}

beforeAll(async () => {
  await seedOnce();
});

afterEach(() => {
  vi.restoreAllMocks();
});

describe("log lines carry no SQL parameters or personal data", () => {
  it("the synchronous driver error names the constraint, not the values, and is logged as it is", () => {
    let error: unknown;
    try {
      db().insert(users).values({ email: EMAIL, name: NAME }).run();
    } catch (e) {
      error = e;
    }
    const spy = vi.spyOn(console, "error").mockImplementation(() => undefined);
    logError("action", "unexpected failure", error);
    const text = captured(spy);
    expect(text).toContain("SqliteError [SQLITE_CONSTRAINT_UNIQUE]: UNIQUE constraint failed: users.email");
    expect(text).not.toContain(EMAIL);
    expect(text).not.toContain(NAME);
  });

  it("the failing query's own message does carry them (why the helper exists)", async () => {
    const error = (failingQuery()) as Error;
    expect(error).toBeInstanceOf(DrizzleQueryError);
    expect(`${error.message}\n${inspect(error)}`).toContain(EMAIL);
    expect(inspect(error)).toContain(NAME);
  });

  it("logError prints the scope, the error's name and code, and withholds the statement and its parameters", async () => {
    const spy = vi.spyOn(console, "error").mockImplementation(() => undefined);
    logError("action", "unexpected failure", failingQuery(), { eventId: "evt_1" });
    expect(spy).toHaveBeenCalledTimes(1);
    const text = captured(spy);
    expect(text).toMatch(/^\[action\] unexpected failure eventId=evt_1 — /);
    expect(text).toContain("database query failed (statement and parameters withheld)");
    expect(text).toContain("SQLITE_CONSTRAINT_UNIQUE");
    expect(text).not.toContain(EMAIL);
    expect(text).not.toContain(NAME);
    expect(text).not.toMatch(/params|insert into/i);
  });

  it("e-mail addresses and long numbers are masked in any message, details included", () => {
    const spy = vi.spyOn(console, "warn").mockImplementation(() => undefined);
    logWarn("outbox", "provider refused", new Error(`recipient ${EMAIL} rejected, card 4242424242424242`), { to: EMAIL });
    const text = captured(spy);
    expect(text).toContain("[email]");
    expect(text).toContain("[number]");
    expect(text).not.toContain(EMAIL);
    expect(text).not.toContain("4242424242424242");
    expect(scrubText("Failed query: select 1\nparams: a@b.example,42")).toBe("Failed query: select 1\n[parameters withheld]");
  });

  it("a cause chain is described link by link, each scrubbed", async () => {
    const outer = new Error("webhook step failed", { cause: failingQuery() });
    const text = describeError(outer, false);
    expect(text).toMatch(/^Error: webhook step failed ← caused by DrizzleQueryError: database query failed .* ← caused by SqliteError \[SQLITE_CONSTRAINT_UNIQUE\]: UNIQUE constraint failed: users\.email$/);
    expect(text).not.toContain(EMAIL);
  });

  it("after installConsoleScrubber, a bare console.error of the error (as the framework does) is scrubbed too", async () => {
    const error = failingQuery();
    const spy = vi.spyOn(console, "error").mockImplementation(() => undefined);
    const undo = installConsoleScrubber();
    try {
      console.error("⨯ uncaught in /clubs/x/money", error, { user: EMAIL });
      console.error(`Error for ${EMAIL}: Failed query: insert into users values (?, ?)\nparams: ${EMAIL},${NAME}`);
    } finally {
      undo();
    }
    const text = captured(spy);
    expect(spy).toHaveBeenCalledTimes(2);
    expect(text).toContain("SQLITE_CONSTRAINT_UNIQUE");
    expect(text).not.toContain(EMAIL);
    expect(text).not.toContain(NAME);
  });
});
