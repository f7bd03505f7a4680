// Malformed input thrown at every server action exported from lib/actions/** (files marked
// "use server"). Each action's fields come from its own zod schema; a plausible baseline form is
// built from the seeded data, then one field at a time is made wrong (impossible and
// out-of-range dates, invalid ids, huge strings, negative/NaN/Infinity numbers, arrays where one
// value is expected, files that are not what they claim), or the form is broken as a whole
// (empty, no club, another club, prototype-pollution keys). Every call must answer with a
// specific refusal (no exception, no generic "Something went wrong") and leave every table and
// the upload folder as it was. FUZZ_SEED=<n> reproduces a run.
import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import type { z } from "zod";
import type { ActionState } from "@/lib/actions/action-state";
import { EMPTY, signInAs } from "./helpers";
import {
  BAD_DATES, BAD_IDS, BAD_MONTHS, BROAD_USER, FUZZ_CLUB, GENERIC_BAD, HUGE, PLAIN_MEMBER, POLLUTION_KEYS, ROOT, changedTables, fingerprint, prototypeIsClean, realIds, rng, seedAllOnce, seedFromEnv, walk, widenAdminRoles,
  BAD_DATETIMES, idsFor,
} from "./fuzz-helpers";

// The sign-in actions hand a well-formed form to the auth library; here it answers as for a
// wrong password, so that only their own parsing is exercised (the library needs a live request).
vi.mock("@/auth", async () => {
  const { CredentialsSignin } = await import("next-auth");
  return {
    signIn: async () => {
      throw new CredentialsSignin();
    },
    signOut: async () => undefined,
    auth: async () => null,
    handlers: {},
  };
});

const SEED = seedFromEnv(20261203);
const CASES = 12; // per action and signed-in person
const PEOPLE = [BROAD_USER, PLAIN_MEMBER];
const GENERIC_FAILURE = /something went wrong/i;

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;
type Field = { name: string; schema: z.ZodType; baseline?: string; kind: "date" | "datetime" | "month" | "id" | "file" | "other" };
type Found = { file: string; name: string; action: Action; fields: Field[]; schema?: z.ZodType };

type Def = { type?: string; in?: Node; out?: Node; innerType?: Node; options?: Node[]; entries?: Record<string, string> };
type Node = { shape?: Record<string, z.ZodType>; _zod?: { def: Def } };

function shapeOf(schema: unknown): Record<string, z.ZodType> {
  let node = schema as Node | undefined;
  for (let i = 0; i < 6 && node; i++) {
    if (node.shape) return node.shape;
    const def: Def | undefined = node._zod?.def;
    node = def?.out ?? def?.innerType ?? def?.in;
  }
  return {};
}

function enumValues(schema: unknown, depth = 0): string[] {
  const def = (schema as Node | undefined)?._zod?.def;
  if (!def || depth > 8) return [];
  if (def.type === "enum" && def.entries) return Object.values(def.entries);
  for (const next of [def.innerType, def.in, def.out, ...(def.options ?? [])]) {
    const found = enumValues(next, depth + 1);
    if (found.length) return found;
  }
  return [];
}

const accepts = (schema: z.ZodType, value: unknown) => schema.safeParse(value).success;

/** Where one field's valid value depends on another's (an end after its start, weights in order). */
const BASELINE_BY_NAME: Record<string, string> = {
  endsAt: "2026-12-01T11:00", startTime: "09:00", endTime: "11:00", flyingDayOpens: "07:00", flyingDayCloses: "21:00", confirmPreflight: "on", birthDate: "1980-04-02", timeZone: "America/Chicago", locale: "en-US", emptyWeight: "1500", maxTakeoffWeight: "2300", year: "2026",
};
const PLAIN_TEXT = "A plain description that is long enough for every check";
const NOT_DATES = [PLAIN_TEXT, "Rowan Pike", "N0123X", "abc", "12", "Cockpit: documents aboard"];
const TEXT_CANDIDATES = [
  "2026-03-01", "2026-12-01T10:00", "2026-03", "12.50", "1", "on",
  PLAIN_TEXT, "name@example.com", "Rowan Pike",
  "Front seats | 37 | 400", "Left wing tank | 48 | 20", "35, 1500\n47, 1500\n40, 2300", "Left wing: aileron free and correct",
];

function buildFields(schema: unknown, ids: Record<string, string[]>): Field[] {
  return Object.entries(shapeOf(schema)).map(([name, fieldSchema]) => {
    const fromIds = /Ids?$/.test(name) ? idsFor(name, ids) : [];
    const candidates = [...(BASELINE_BY_NAME[name] ? [BASELINE_BY_NAME[name]] : []), ...fromIds, ...enumValues(fieldSchema), ...TEXT_CANDIDATES];
    const baseline = candidates.find((c) => accepts(fieldSchema, c));
    // A field is a date (or a month, a date and time) when it takes one and refuses plain words.
    const only = (example: string) => accepts(fieldSchema, example) && !NOT_DATES.some((v) => accepts(fieldSchema, v));
    const kind: Field["kind"] =
      /photo|document$|attachment|^file$/i.test(name) ? "file"
      : /Ids?$/.test(name) ? "id"
      : only("2026-03-01") && !accepts(fieldSchema, "2026-12-01T10:00") ? "date"
      : only("2026-12-01T10:00") ? "datetime"
      : only("2026-03") && !accepts(fieldSchema, "2026-03-01") ? "month"
      : "other";
    return { name, schema: fieldSchema, baseline, kind };
  });
}

const badFiles = () => [
  new File([Buffer.from("this is not a photo at all\n")], "photo.jpg", { type: "image/jpeg" }),
  new File([Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(300, 7)])], "broken.jpg", { type: "image/jpeg" }),
  new File([Buffer.from("000000186674797068656963000000006d69663168656963", "hex")], "phone.heic", { type: "image/heic" }),
  new File([Buffer.from("MZ\x90\x00 pretending to be a pdf")], "work-order.pdf", { type: "application/pdf" }),
];

async function discoverActions(): Promise<Found[]> {
  const schemas = new Map<string, unknown>();
  for (const file of walk(path.join(ROOT, "lib/validation"), (f) => f.endsWith(".ts"))) {
    for (const [name, value] of Object.entries(await import(file))) if (value && typeof (value as z.ZodType).safeParse === "function") schemas.set(name, value);
  }
  const ids = realIds(3);
  const found: Found[] = [];
  const files = walk(path.join(ROOT, "lib/actions"), (f) => f.endsWith(".ts") && /^\s*["']use server["']/.test(fs.readFileSync(f, "utf8")));
  for (const file of files) {
    const source = fs.readFileSync(file, "utf8");
    const mod = (await import(file)) as Record<string, unknown>;
    const named = [...source.matchAll(/\b(\w+Schema)\b/g)].map((m) => m[1]!).filter((n) => schemas.has(n));
    for (const [name, value] of Object.entries(mod)) {
      if (typeof value !== "function") continue;
      const own = new RegExp(`export const ${name}\\s*=\\s*(?:clubAction|userAction)\\(\\{[\\s\\S]*?schema:\\s*(\\w+)`).exec(source)?.[1];
      const schemaNames = own ? [own] : named;
      const fields = schemaNames.flatMap((n) => (schemas.has(n) ? buildFields(schemas.get(n), ids) : []));
      found.push({ file: path.relative(ROOT, file), name, action: value as Action, fields, schema: own ? (schemas.get(own) as z.ZodType | undefined) : undefined });
    }
  }
  return found;
}

/** Values this field must refuse: every bad date, month, id or file for a field of that kind
 *  (whatever its schema says), else the generic ones its own schema refuses. */
function badValuesFor(f: Field): unknown[] {
  if (f.kind === "file") return badFiles();
  if (f.kind === "date") return BAD_DATES;
  if (f.kind === "datetime") return BAD_DATETIMES;
  if (f.kind === "month") return BAD_MONTHS;
  if (f.kind === "id") return BAD_IDS;
  return GENERIC_BAD.filter((v) => !accepts(f.schema, v));
}

function toForm(values: Record<string, unknown>): FormData {
  const fd = new FormData();
  for (const [k, v] of Object.entries(values)) {
    if (v === undefined) continue;
    for (const item of Array.isArray(v) ? v : [v]) fd.append(k, item instanceof Blob ? item : String(item));
  }
  return fd;
}

describe("fuzz: every server action refuses malformed input specifically and writes nothing", () => {
  let actions: Found[] = [];

  beforeAll(async () => {
    await seedAllOnce();
    widenAdminRoles();
    actions = await discoverActions();
    vi.spyOn(console, "error").mockImplementation(() => undefined);
  }, 60_000);

  afterAll(() => {
    vi.restoreAllMocks();
  });

  it("finds the actions", () => {
    expect(actions.length).toBeGreaterThanOrEqual(55);
    // Only actions without input (an empty schema, or none) have no fields to make wrong.
    const withoutFields = actions.filter((a) => a.fields.length === 0).map((a) => a.name).sort();
    expect(withoutFields).toEqual(["produceDueBillsAction", "sendDocumentReminders", "sendReminders", "signOutAction", "startCardPayment"]);
  });

  it("builds a valid form for nearly every action, so that each refusal comes from the one field made wrong", () => {
    const invalid = actions
      .filter((a) => a.schema)
      .filter((a) => !a.schema!.safeParse(Object.fromEntries(a.fields.filter((f) => f.baseline !== undefined).map((f) => [f.name, f.baseline]))).success)
      .map((a) => a.name);
    // Bank-match items carry prefixed ids ("line:…") that no table holds as such.
    expect(invalid).toEqual(["matchBankLine"]);
  });

  it("every date, month and id field refuses impossible and out-of-range values", () => {
    const problems: string[] = [];
    for (const a of actions) {
      for (const f of a.fields) {
        const bad = f.kind === "date" ? BAD_DATES : f.kind === "datetime" ? BAD_DATETIMES : f.kind === "month" ? BAD_MONTHS : f.kind === "id" ? BAD_IDS : [];
        for (const v of bad) if (accepts(f.schema, v)) problems.push(`${a.name}.${f.name} accepts ${JSON.stringify(v.slice(0, 40))}`);
      }
    }
    expect(problems).toEqual([]);
  });

  it("answers every malformed form with a specific refusal and writes nothing", async () => {
    const r = rng(SEED);
    const failures: string[] = [];
    let calls = 0;
    for (const a of actions) {
      if (a.action.length === 0) continue; // signOutAction takes no input at all
      for (const person of PEOPLE) {
        signInAs(person);
        for (let i = 0; i < CASES; i++) {
          const form: Record<string, unknown> = { club: FUZZ_CLUB };
          for (const f of a.fields) if (f.baseline !== undefined) form[f.name] = f.baseline;
          let what: string;
          const mutable = a.fields.filter((f) => badValuesFor(f).length > 0);
          if (i === 0) {
            for (const k of Object.keys(form)) delete form[k];
            what = "an empty form";
          } else if (i === 1 || mutable.length === 0) {
            form.club = r.pick(["", HUGE, "cottonwood-flyers", "no-such-club", "../reedwater"]);
            for (const f of a.fields) if (r.chance(0.5)) form[f.name] = r.pick(GENERIC_BAD);
            what = `club ${JSON.stringify(String(form.club).slice(0, 30))} with random fields`;
          } else {
            const f = r.pick(mutable);
            let value: unknown = r.pick(badValuesFor(f));
            // Sometimes the wrong value arrives twice (an array where one value is expected), or a required field is left out.
            if (r.chance(0.15) && f.kind !== "file" && !accepts(f.schema, [f.baseline ?? "", value])) value = [f.baseline ?? "", value];
            if (r.chance(0.1) && !accepts(f.schema, undefined)) value = undefined;
            form[f.name] = value;
            // Prototype-pollution keys, once or twice (twice makes the form reader build an array).
            if (r.chance(0.3)) for (const k of POLLUTION_KEYS) form[k] = r.chance(0.5) ? ['{"polluted":true}', "polluted"] : r.pick(['{"polluted":true}', "polluted", HUGE.slice(0, 100)]);
            what = `${f.name} = ${value instanceof File ? `file "${value.name}"` : JSON.stringify(value)?.slice(0, 60) ?? "(missing)"}`;
          }
          const label = `${a.name} (${a.file}) #${i} as ${person} (seed ${SEED}): ${what}`;
          const before = fingerprint();
          let state: ActionState | undefined;
          try {
            state = await a.action(EMPTY, toForm(form));
          } catch (error) {
            failures.push(`${label} threw ${(error as Error).message?.slice(0, 160)}`);
          } finally {
            calls++;
          }
          if (state?.ok) failures.push(`${label} was accepted: ${state.message}`);
          if (state && GENERIC_FAILURE.test(state.message)) failures.push(`${label} failed generically`);
          const changed = changedTables(before, fingerprint());
          if (changed.length) failures.push(`${label} wrote to ${changed.join(", ")}`);
        }
      }
    }
    console.info(`[fuzz-actions] seed ${SEED}: ${actions.length} actions × ${PEOPLE.length} people × ${CASES} cases = ${calls} calls`);
    expect(failures.slice(0, 25)).toEqual([]);
    expect(prototypeIsClean()).toBe(true);
  }, 120_000);
});
