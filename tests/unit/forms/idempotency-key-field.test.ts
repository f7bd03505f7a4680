// Every form that posts to a server action carries the submission key (components/ui/idempotency-key-field.tsx),
// read from the source so that a new form is covered without anyone remembering. Forms that write are
// <FormShell> (components/ui/form-shell.tsx), which puts the key in; tests/unit/forms/form-pattern.test.ts
// refuses any other writing form. A GET form (a calculator's query string) writes nothing and needs none.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { newIdempotencyKey } from "@/components/ui/idempotency-key-field";

const ROOT = path.resolve(import.meta.dirname, "../../..");

function sourceFiles(dir: string): string[] {
  return fs.readdirSync(path.join(ROOT, dir), { withFileTypes: true }).flatMap((e) => {
    const rel = path.join(dir, e.name);
    if (e.isDirectory()) return sourceFiles(rel);
    return e.name.endsWith(".tsx") ? [rel] : [];
  });
}

/** Each `<form …>…</form>` in a file: its opening tag and its body. */
function forms(source: string): { tag: string; body: string }[] {
  const out: { tag: string; body: string }[] = [];
  const re = /<form\b/g;
  let m: RegExpExecArray | null;
  while ((m = re.exec(source))) {
    const end = source.indexOf("</form>", m.index);
    const chunk = source.slice(m.index, end === -1 ? undefined : end);
    const tagEnd = chunk.search(/>\s*\n/);
    out.push({ tag: chunk.slice(0, tagEnd === -1 ? chunk.length : tagEnd + 1), body: chunk });
  }
  return out;
}

describe("every form that posts to an action sends an idempotency key", () => {
  const files = [...sourceFiles("components"), ...sourceFiles("app")];
  const posting = files.flatMap((file) =>
    forms(fs.readFileSync(path.join(ROOT, file), "utf8"))
      .filter((f) => !/method="get"/i.test(f.tag))
      .map((f) => ({ file, ...f })),
  );

  it("finds the forms (the scan itself works)", () => {
    expect(posting.length).toBeGreaterThan(0);
    const shells = files.flatMap((file) => fs.readFileSync(path.join(ROOT, file), "utf8").match(/<FormShell\b/g) ?? []);
    expect(shells.length).toBeGreaterThan(40);
  });

  it.each(posting.map((f, i) => [`${f.file} #${i}`, f] as const))("%s", (_name, f) => {
    expect(f.body, `${f.file}: add <IdempotencyKeyField answer={state} /> inside ${f.tag}`).toMatch(/<IdempotencyKeyField\b/);
  });
});

describe("newIdempotencyKey", () => {
  it("makes distinct v4 UUIDs the server accepts (16–128 of letters, digits, - _ . :)", () => {
    const keys = Array.from({ length: 50 }, () => newIdempotencyKey());
    expect(new Set(keys).size).toBe(50);
    for (const k of keys) expect(k).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
  });

  it("still makes one where crypto.randomUUID is missing (plain http on a phone)", () => {
    const original = crypto.randomUUID;
    try {
      Object.defineProperty(crypto, "randomUUID", { value: undefined, configurable: true });
      expect(newIdempotencyKey()).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    } finally {
      Object.defineProperty(crypto, "randomUUID", { value: original, configurable: true });
    }
  });
});
