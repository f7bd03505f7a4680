import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { StatusBadge } from "@/components/ui/status-badge";

// Status is never colour alone (our product rule): each status has its word and its own shape.
describe("StatusBadge", () => {
  const statuses = ["flyable", "limited", "grounded", "unknown"] as const;
  const html = Object.fromEntries(statuses.map((s) => [s, renderToStaticMarkup(createElement(StatusBadge, { status: s }))]));

  it("says the status in words", () => {
    expect(statuses.map((s) => />([^<>]+)<\/span><\/span>$/.exec(html[s]!)?.[1])).toEqual(["Flyable", "Flyable with limits", "Grounded", "Check status"]);
  });

  it("draws a different shape for each status, hidden from screen readers (the word is read)", () => {
    const shapes = statuses.map((s) => /<svg[^>]*>(.*?)<\/svg>/.exec(html[s]!)?.[1]);
    expect(new Set(shapes).size).toBe(4);
    for (const s of statuses) expect(html[s]).toMatch(/<svg[^>]*aria-hidden="true"/);
    expect(html.unknown).toContain(">?</text>");
  });
});
