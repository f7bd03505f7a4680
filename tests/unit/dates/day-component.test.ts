import { createElement } from "react";
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { Day, dayText } from "@/components/ui/day";

// A club's calendar day as its locale writes it (Unicode CLDR medium date patterns, via Intl),
// inside a <time> that keeps the ISO 8601 day for machines.
describe("a calendar day on a page", () => {
  it("is written in the club's locale and keeps the ISO day in <time datetime>", () => {
    expect(renderToStaticMarkup(createElement(Day, { date: "2026-12-02", locale: "en-US" }))).toBe('<time dateTime="2026-12-02" class="whitespace-nowrap">Dec 2, 2026</time>'); // CLDR en-US medium: MMM d, y
    expect(renderToStaticMarkup(createElement(Day, { date: "2026-12-02", locale: "de-DE" }))).toContain(">02.12.2026<"); // CLDR de medium: dd.MM.y
    expect(dayText("2026-04-01", "en-GB")).toBe("1 Apr 2026"); // CLDR en-GB medium: d MMM y
  });

  it("shows anything that is not a day as it stands, and a missing day as a dash", () => {
    expect(renderToStaticMarkup(createElement(Day, { date: "next spring", locale: "en-US" }))).toBe("next spring");
    expect(renderToStaticMarkup(createElement(Day, { date: null }))).toBe("—");
    expect(dayText("2026-13-40")).toBe("2026-13-40");
  });
});
