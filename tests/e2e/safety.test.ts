import { describe, expect, it } from "vitest";
import { expectNoHorizontalOverflow, newPage, screenshot, signIn, waitForEmail } from "./harness";

const CLUB = "/clubs/reedwater";

function isoDatePlus(days: number): string {
  return new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);
}

async function ackCount(page: import("playwright-core").Page): Promise<{ done: number; of: number }> {
  const text = (await page.getByTestId("ack-count").textContent()) ?? "";
  const m = /(\d+) of (\d+)/.exec(text);
  if (!m) throw new Error(`No count in "${text}"`);
  return { done: Number(m[1]), of: Number(m[2]) };
}

describe("safety bulletins in the browser", () => {
  it("the officer publishes with a deadline; a member acknowledges from the home page; the officer's count moves", async () => {
    const title = `Fuel cap seals — check before flight ${Date.now()}`;
    const deadline = isoDatePlus(7);

    const officer = await newPage("desktop");
    await signIn(officer, "safety@hangarline.test");
    await officer.goto(`${CLUB}/safety/bulletins/new`);
    const form = officer.getByRole("form", { name: "New bulletin" });
    await form.getByLabel("Title").fill(title);
    await form.getByLabel("Text").fill("Rain got past a worn **fuel cap seal** this week.\n\n- Check each seal on the walk-around.\n- Drain every sump until the sample is clear.");
    await form.getByLabel(/^Urgent/).check();
    await form.getByLabel("Audience").selectOption("everyone");
    await form.getByLabel("Acknowledge by (optional)").fill(deadline);
    await form.getByRole("button", { name: "Publish and send" }).click();
    await officer.waitForURL(/\/safety\/bulletins\/[^/?]+\?published=\d+/);
    await officer.getByRole("heading", { name: title }).waitFor();
    await officer.getByText(`Acknowledge by ${deadline}`).waitFor();
    const before = await ackCount(officer);
    expect(before.done).toBe(0);
    expect(before.of).toBeGreaterThan(1);

    // Publishing went through the outbox to the fake provider.
    const mail = await waitForEmail("pilot2@hangarline.test", (m) => m.subject.includes(title));
    expect(mail.subject).toBe(`[Urgent] Safety bulletin: ${title}`);

    const member = await newPage("phone");
    await signIn(member, "pilot2@hangarline.test");
    await member.goto(CLUB);
    const waiting = member.getByRole("list", { name: "Bulletins to acknowledge" });
    await waiting.getByRole("link", { name: title }).click();
    await member.waitForURL(/\/safety\/bulletins\//);
    await member.getByText("fuel cap seal", { exact: false }).first().waitFor();
    await expectNoHorizontalOverflow(member);
    await member.getByRole("form", { name: "Acknowledge bulletin" }).getByRole("button", { name: "Acknowledge" }).click();
    await member.getByText(/You acknowledged this on \d{4}-\d{2}-\d{2}\./).waitFor();
    await member.goto(CLUB);
    expect(await member.getByRole("link", { name: title }).count()).toBe(0);
    await screenshot(member, "safety-member-home-after-ack");
    await member.context().close();

    // The officer's page refreshes its own count.
    await expect.poll(async () => (await ackCount(officer)).done, { timeout: 20_000, interval: 1000 }).toBe(1);
    expect((await ackCount(officer)).of).toBe(before.of);
    await officer.getByRole("table").getByText("Gus Henneberry").waitFor();
    await screenshot(officer, "safety-officer-acknowledgements");
    await officer.context().close();
  });
});
