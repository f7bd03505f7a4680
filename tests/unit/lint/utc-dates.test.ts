import { ESLint } from "eslint";
import { describe, expect, it } from "vitest";

// Screens, action answers and e-mails take calendar dates and times from the club's time zone
// (our product rule: a US evening must not read as tomorrow). The lint rules refuse the usual ways
// of cutting a UTC date or time out of an ISO instant.
const eslint = new ESLint({ cwd: process.cwd() });

async function refusals(code: string, filePath: string): Promise<number> {
  const [result] = await eslint.lintText(code, { filePath });
  return result!.messages.filter((m) => m.ruleId === "no-restricted-syntax").length;
}

describe("no UTC calendar dates on screens", { timeout: 60_000 }, () => {
  const cases = [
    'export const a = (d: Date) => d.toISOString().slice(0, 10);',
    'export const b = (s: string) => s.split("T")[0];',
    'export const c = (s: string) => s.slice(0, 16).replace("T", " ");',
  ];

  it.each(["app/x/page.tsx", "components/x.tsx", "lib/actions/x/y.ts", "emails/x.tsx"])("refuses each way of cutting a UTC date in %s", async (file) => {
    for (const code of cases) expect(await refusals(code, file), code).toBe(1);
  });

  it("lets the club's own day through", async () => {
    expect(await refusals('import { isoDateInTimeZone } from "@/lib/dates";\nexport const d = (at: Date, tz: string) => isoDateInTimeZone(at, tz);', "components/x.tsx")).toBe(0);
  });
});
