import { describe, expect, it } from "vitest";
import { deflateSync } from "node:zlib";
import { expectNoHorizontalOverflow, newPage, screenshot, signIn } from "./harness";

// Uses Cottonwood Flyers' N0488C (no other browser test relies on it) so grounding it here
// cannot change what the other tests see.
const CLUB = "/clubs/cottonwood-flyers";
const REG = "N0488C";

/** A small real PNG made here: 8×8 grey pixels, chunks with their CRC-32 (PNG specification). */
function pngBytes(): Buffer {
  const crcTable = Array.from({ length: 256 }, (_, n) => {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    return c >>> 0;
  });
  const crc = (buf: Buffer) => {
    let c = 0xffffffff;
    for (const b of buf) c = crcTable[(c ^ b) & 0xff]! ^ (c >>> 8);
    return (c ^ 0xffffffff) >>> 0;
  };
  const chunk = (type: string, data: Buffer) => {
    const body = Buffer.concat([Buffer.from(type, "ascii"), data]);
    const out = Buffer.alloc(8 + data.length + 4);
    out.writeUInt32BE(data.length, 0);
    body.copy(out, 4);
    out.writeUInt32BE(crc(body), 8 + data.length);
    return out;
  };
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(8, 0);
  ihdr.writeUInt32BE(8, 4);
  ihdr.set([8, 0, 0, 0, 0], 8); // 8-bit greyscale
  const rows = Buffer.concat(Array.from({ length: 8 }, () => Buffer.from([0, ...Array(8).fill(0x80)])));
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk("IHDR", ihdr), chunk("IDAT", deflateSync(rows)), chunk("IEND", Buffer.alloc(0))]);
}

describe("flight line and squawks in the browser", () => {
  it("the flight line shows every aircraft with a status word and the airworthiness caution", async () => {
    const page = await newPage("desktop");
    await signIn(page, "cottonwood.pilot@hangarline.test");
    await page.goto(`${CLUB}/flight-line`);
    await expect(page.getByRole("note", { name: "Airworthiness caution" }).textContent()).resolves.toMatch(/pilot in command decides airworthiness/i);
    const cards = page.locator("article[data-registration]");
    expect(await cards.count()).toBe(2);
    for (const card of await cards.all()) {
      expect(await card.locator("[data-status] svg[data-shape]").count()).toBe(1); // a shape beside the word
      expect(await card.locator("[data-status]").first().textContent()).toMatch(/Flyable|Flyable with limits|Grounded|Status unknown/);
    }
    await screenshot(page, "fleet-flight-line-desktop");
  });

  it("a member on a phone reports a squawk with a photo; the flight line then shows the aircraft grounded with the reason", async () => {
    const page = await newPage("phone");
    await signIn(page, "cottonwood.pilot@hangarline.test");
    await page.goto(`${CLUB}/flight-line`);
    const card = page.locator(`article[data-registration="${REG}"]`);
    expect(await card.getAttribute("data-status")).not.toBe("grounded");
    await expectNoHorizontalOverflow(page);

    await card.getByRole("link", { name: REG }).click();
    await page.waitForURL(/\/aircraft\/[^/]+$/);
    await page.getByRole("heading", { name: REG, level: 1 }).waitFor();
    await page.getByRole("note", { name: "Airworthiness caution" }).waitFor();
    const description = `Aileron hinge pin walking out, right wing ${Date.now()}`;
    const form = page.getByRole("form", { name: `Report a squawk on ${REG}` });
    await form.getByLabel("What did you find?").fill(description);
    await form.getByLabel("Found during").selectOption("preflight");
    await form.getByLabel("I think this may make the aircraft unsafe to fly").check();
    await form.getByLabel("Photos (optional)").setInputFiles({ name: "hinge.png", mimeType: "image/png", buffer: pngBytes() });
    await form.getByRole("button", { name: "Report squawk" }).click();
    // The action's own answer, in the form's status region, quoting what was reported.
    const answer = form.getByRole("status").filter({ hasText: `Squawk reported: “${description}”.` });
    await answer.waitFor();
    // Marked as possibly unsafe, it was e-mailed to maintenance at once: the answer says so, and nothing more.
    expect(await answer.textContent()).toMatch(new RegExp(`^Squawk reported: “${description}”\\. Maintenance \\(\\d+ (person|people)\\)[^“”]* e-mailed\\.$`));
    // The form is ready for the next report; the refreshed list shows this one with its photo.
    expect(await form.getByLabel("What did you find?").inputValue()).toBe("");
    await page.getByRole("listitem").filter({ hasText: description }).getByRole("img", { name: "Photo: hinge.png" }).waitFor();
    await expectNoHorizontalOverflow(page);

    await page.goto(`${CLUB}/flight-line`);
    const after = page.locator(`article[data-registration="${REG}"]`);
    expect(await after.getAttribute("data-status")).toBe("grounded");
    await after.getByText("Grounded", { exact: true }).waitFor();
    await after.getByText(`Squawk reported as affecting airworthiness, awaiting triage: ${description}`).waitFor();
    await expectNoHorizontalOverflow(page);
    await screenshot(page, "fleet-flight-line-phone-grounded");
  });

  it("maintenance sees the squawk with its photo in the work queue", async () => {
    const page = await newPage("desktop");
    await signIn(page, "cottonwood.maint@hangarline.test");
    await page.goto(`${CLUB}/maintenance`);
    const queue = page.getByRole("region", { name: "Squawks awaiting triage" });
    await queue.getByText(/Aileron hinge pin walking out/).first().waitFor();
    await queue.getByRole("img", { name: "Photo: hinge.png" }).first().waitFor();
    await expectNoHorizontalOverflow(page);
    await screenshot(page, "fleet-maintenance-desktop");
  });
});

describe("maintenance blocks on the flight line", () => {
  it("shows a block of the club's day beside the aircraft, on the club's clock, on a desktop and a phone", async () => {
    const page = await newPage("desktop");
    await signIn(page, "cottonwood.maint@hangarline.test");
    // The club's clock (America/Denver): from the quarter hour just begun, for two hours, so the
    // block is in force now whatever the time of the run.
    const parts = Object.fromEntries(
      new Intl.DateTimeFormat("en-US", { timeZone: "America/Denver", hourCycle: "h23", year: "numeric", month: "2-digit", day: "2-digit", hour: "2-digit", minute: "2-digit" })
        .formatToParts(new Date())
        .map((p) => [p.type, p.value]),
    );
    const local = (h: number, m: number, dayShift = 0) => {
      const d = new Date(Date.UTC(Number(parts.year), Number(parts.month) - 1, Number(parts.day) + dayShift, h, m));
      return d.toISOString().slice(0, 16);
    };
    const hour = Number(parts.hour);
    const minute = Math.floor(Number(parts.minute) / 15) * 15;
    const from = local(hour, minute);
    const until = local(hour + 2, minute);
    const reason = `Magneto timing check ${Date.now()}`;
    await page.goto(`${CLUB}/bookings/blocks`);
    const form = page.getByRole("form", { name: "Block an aircraft for maintenance" });
    const aircraftId = await form.getByLabel("Aircraft").locator("option", { hasText: `${REG} — ` }).getAttribute("value");
    await form.getByLabel("Aircraft").selectOption(aircraftId!);
    await form.getByLabel("From (club time)").fill(from);
    await form.getByLabel("Until (club time)").fill(until);
    await form.getByLabel("Reason, shown to members").fill(reason);
    await form.getByRole("button", { name: "Block this time" }).click();
    await form.getByRole("status").filter({ hasText: `${REG} blocked for maintenance` }).waitFor();

    await page.goto(`${CLUB}/flight-line`);
    const blocks = page.getByRole("region", { name: `Maintenance blocks for ${REG}` });
    const line = blocks.getByText(reason, { exact: false });
    await line.waitFor();
    const text = (await line.textContent()) ?? "";
    // On the club's clock, the start as entered: "HH:MM" of the form's value.
    expect(text).toContain(from.slice(11, 16));
    expect(text).toMatch(/^Maintenance block /);
    expect(text).toContain("Bookings are refused while it lasts.");
    await screenshot(page, "fleet-flight-line-block-desktop");
    await page.setViewportSize({ width: 390, height: 844 });
    await expectNoHorizontalOverflow(page);
    await screenshot(page, "fleet-flight-line-block-phone");
    await page.context().close();
  });
});
