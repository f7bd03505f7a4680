import { describe, expect, it } from "vitest";
import { markdownToParagraphs } from "@/lib/safety/plain-text";

describe("markdownToParagraphs — bulletin text for e-mail", () => {
  it("takes formatting marks off and keeps link addresses in words", () => {
    const md = "# Brakes\n\nPress **each** pedal for *five* seconds.\nSee [the checklist](https://example.test/c).\n\n- walk-around\n- fairings\n\n> stay safe";
    expect(markdownToParagraphs(md)).toEqual([
      "Brakes",
      "Press each pedal for five seconds. See the checklist (https://example.test/c).",
      "• walk-around\n• fairings",
      "stay safe",
    ]);
  });

  it("never passes HTML through as markup: tags stay visible text for React Email to escape", () => {
    expect(markdownToParagraphs("<b>hi</b>\r\n\r\n```\ncode\n```")).toEqual(["<b>hi</b>", "code"]);
  });
});
