import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { StatusBadge } from "@/components/ui/status-badge";

// Status is never colour alone (our product rule): each status has its word and its own shape.
describe("StatusBadge", () => {
  const statuses = ["flyable", "limited", "grounded", "unknown"] as const;
  const html = Object.fromEntries(statuses.map((s) => [s, renderToStaticMarkup(createElement(StatusBadge, { status: s }))]));

  it("says the status in words", () => {
    expect(statuses.map((s) => />([^<>]+)<\/span><\/span>$/.exec(html[s]!)?.[1])).toEqual(["Flyable", "Flyable with limits", "Grounded", "Status unknown"]);
  });

  it("shows a status that was never computed as unknown, never as flyable (our product rule)", () => {
    expect(renderToStaticMarkup(createElement(StatusBadge, { status: undefined }))).toBe(html.unknown);
  });

  it("tells the four apart by border style too, so a grey-scale screen still shows them (our product rule)", () => {
    const borders = statuses.map((s) => /border-(solid|double|dashed)/.exec(html[s]!)?.[1]);
    expect(borders).toEqual(["solid", "double", "solid", "dashed"]);
    expect(html.grounded).toMatch(/bg-plum-800/); // the only filled badge
    for (const s of statuses) expect(html[s]).not.toMatch(/(green|amber|yellow|red)-/);
  });

  it("draws a different shape for each status, hidden from screen readers (the word is read)", () => {
    const shapes = statuses.map((s) => /<svg[^>]*>(.*?)<\/svg>/.exec(html[s]!)?.[1]);
    expect(new Set(shapes).size).toBe(4);
    for (const s of statuses) expect(html[s]).toMatch(/<svg[^>]*aria-hidden="true"/);
    // The unknown mark's question mark is drawn (a stroke and a dot), never a text character that
    // would join the badge's words.
    expect(html.unknown).not.toContain("<text");
    expect(html.unknown).toMatch(/<path[^>]*stroke-linecap="round"/);
  });
});
