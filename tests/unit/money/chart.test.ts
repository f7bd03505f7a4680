// Sources: the five account types and "a posted account keeps its history" are standard
// accounting practice; a parent account of the same type (a sub-account rolls up into it) is
// common practice for a chart of accounts. The flying-club categories are common practice.
import { describe, expect, it } from "vitest";
import { chartChangeProblems, chartDeleteProblem, DEFAULT_CHART, FLYING_CLUB_CHART, type ChartAccountRow } from "@/lib/money";

const chart: ChartAccountRow[] = [...DEFAULT_CHART, ...FLYING_CLUB_CHART].map((a) => ({ ...a, parentCode: null }));
chart.push({ code: "annual-inspection", name: "Annual inspection", type: "expense", parentCode: "maintenance" });
const row = (code: string, inUse = false) => ({ ...chart.find((a) => a.code === code)!, inUse });

describe("the flying-club chart", () => {
  it("has the categories a flying club books to, each with its usual type (common practice)", () => {
    const byCode = Object.fromEntries(FLYING_CLUB_CHART.map((a) => [a.code, a.type]));
    expect(byCode).toMatchObject({
      "aircraft-insurance": "expense", "hangar-tie-down": "expense", "fuel-oil": "expense", maintenance: "expense",
      "engine-reserve": "expense", "loan-interest": "expense", "instruction-income": "income", "bills-payable": "liability",
    });
    // Dues and flight income are among the application's own accounts (common practice)
    expect(DEFAULT_CHART.map((a) => a.code)).toEqual(expect.arrayContaining(["dues-income", "flight-income"]));
    expect(new Set([...DEFAULT_CHART, ...FLYING_CLUB_CHART].map((a) => a.code)).size).toBe(DEFAULT_CHART.length + FLYING_CLUB_CHART.length);
  });
});

describe("chartChangeProblems", () => {
  it("accepts a new sub-account of the same type", () => {
    expect(chartChangeProblems({ code: "propeller", name: "Propeller overhaul", type: "expense", parentCode: "maintenance" }, null, chart)).toBeNull();
  });

  it("refuses a malformed or duplicate code and a short name", () => {
    expect(chartChangeProblems({ code: "Fuel Oil", name: "x", type: "expense", parentCode: null }, null, chart)).toEqual({
      code: [expect.stringMatching(/lower-case/)],
      name: [expect.stringMatching(/2 to 80/)],
    });
    expect(chartChangeProblems({ code: "fuel-oil", name: "Fuel", type: "expense", parentCode: null }, null, chart)?.code?.[0]).toMatch(/already used by "Fuel and oil"/);
  });

  it("a parent must exist, have the same type, not be the account or below it (standard accounting practice: a sub-account rolls up into its parent)", () => {
    expect(chartChangeProblems({ code: "x-1", name: "X one", type: "income", parentCode: "maintenance" }, null, chart)?.parentCode?.[0]).toMatch(/income account can only sit under another income/);
    expect(chartChangeProblems({ code: "x-1", name: "X one", type: "expense", parentCode: "nowhere" }, null, chart)?.parentCode?.[0]).toMatch(/from the chart/);
    expect(chartChangeProblems({ code: "maintenance", name: "Maintenance", type: "expense", parentCode: "annual-inspection" }, row("maintenance"), chart)?.parentCode?.[0]).toMatch(/below this one/);
    expect(chartChangeProblems({ code: "maintenance", name: "Maintenance", type: "expense", parentCode: "maintenance" }, row("maintenance"), chart)?.parentCode?.[0]).toMatch(/own parent/);
    expect(chartChangeProblems({ code: "x-2", name: "X two", type: "asset", parentCode: "member-receivables" }, null, chart)?.parentCode?.[0]).toMatch(/members' own accounts/);
  });

  it("an account with postings, or the application's own, keeps its code and type but may be renamed (standard accounting practice)", () => {
    expect(chartChangeProblems({ code: "fuel", name: "Fuel", type: "income", parentCode: null }, row("fuel-oil", true), chart)).toEqual({
      code: ["This account has postings; its code cannot change."],
      type: ["This account has postings; its type cannot change."],
    });
    expect(chartChangeProblems({ code: "fuel", name: "Fuel", type: "expense", parentCode: null }, row("fuel-oil", false), chart)).toBeNull();
    expect(chartChangeProblems({ code: "bank", name: "Operating account", type: "asset", parentCode: null }, row("bank", true), chart)).toBeNull();
    expect(chartChangeProblems({ code: "the-bank", name: "Bank", type: "asset", parentCode: null }, row("bank", false), chart)?.code?.[0]).toMatch(/used by the application/);
  });
});

describe("chartDeleteProblem", () => {
  it("deletes only an unused account of the club's own with no sub-accounts", () => {
    expect(chartDeleteProblem(row("aircraft-insurance"), chart)).toBeNull();
    expect(chartDeleteProblem(row("aircraft-insurance", true), chart)).toMatch(/has postings/);
    expect(chartDeleteProblem(row("maintenance"), chart)).toMatch(/move them first/);
    expect(chartDeleteProblem(row("retained-funds"), chart)).toMatch(/used by the application/);
  });
});
