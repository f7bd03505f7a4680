import { beforeAll, describe, expect, it } from "vitest";
import { and, eq } from "drizzle-orm";
import { GET as acksRoute } from "@/app/api/clubs/[club]/safety/bulletins/[bulletinId]/acknowledgements/route";
import { GET as exportRoute } from "@/app/api/clubs/[club]/safety/bulletins/[bulletinId]/acknowledgements/export/route";
import { bulletinAcknowledgements, bulletins, emailOutbox, memberships, uploads, users } from "@/db/schema";
import { recordCheckout } from "@/lib/actions/checkouts/record-checkout";
import { acknowledgeBulletin } from "@/lib/actions/safety/acknowledge-bulletin";
import { createBulletin } from "@/lib/actions/safety/create-bulletin";
import { remindBulletin } from "@/lib/actions/safety/remind-bulletin";
import { updateDraft } from "@/lib/actions/safety/update-draft";
import { EMPTY, clubBySlug, db, expectRedirect, form, seedOnce, signInAs } from "./helpers";
import { callRoute, fakePngFile, seedFleetOnce } from "./fleet-helpers";

const CLUB = "reedwater";
const body = "Before taxi, press each brake pedal and hold it for five seconds.";

function bulletinForm(extra: Record<string, string | Blob> = {}) {
  return form({ club: CLUB, title: "Brake check", bodyMarkdown: body, urgency: "priority", audience: "everyone", intent: "publish", ...extra });
}

/** Publishes through the action (which redirects to the new bulletin) and returns its id. */
async function publish(extra: Record<string, string | Blob> = {}): Promise<string> {
  const to = await expectRedirect(() => createBulletin(EMPTY, bulletinForm(extra)));
  const id = /\/safety\/bulletins\/([^?]+)/.exec(to)?.[1];
  if (!id) throw new Error(`No bulletin id in ${to}`);
  return id;
}

function bulletinMail(bulletinId: string) {
  return db().select().from(emailOutbox).where(eq(emailOutbox.template, "bulletin")).all().filter((m) => String((m.payload as { url: string }).url).endsWith(`/bulletins/${bulletinId}`));
}

function activeReedwaterMemberEmails(): string[] {
  const club = clubBySlug(CLUB);
  return db()
    .select({ email: users.email, roles: memberships.roles })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.clubId, club.id), eq(memberships.status, "active")))
    .all()
    .filter((m) => m.roles.some((r) => r !== "mechanic"))
    .map((m) => m.email)
    .sort();
}

describe("safety bulletins", () => {
  beforeAll(async () => {
    await seedOnce();
    await seedFleetOnce();
    signInAs("instructor@hangarline.test");
    for (const email of ["member@hangarline.test", "pilot2@hangarline.test"]) {
      const userId = db().select().from(users).where(eq(users.email, email)).get()!.id;
      const state = await recordCheckout(EMPTY, form({ club: CLUB, userId, typeGroup: "Fernwhistle F160", checkedOutOn: "2026-01-05", instructorCertificateNumber: "CFI 0007719" }));
      expect(state.ok).toBe(true);
    }
  });

  it("publishing to everyone queues one outbox row per member of the club and none for anyone else", async () => {
    signInAs("safety@hangarline.test");
    const id = await publish();
    const mail = bulletinMail(id);
    const expected = activeReedwaterMemberEmails();
    expect(mail.map((m) => m.toAddress).sort()).toEqual(expected);
    expect(new Set(mail.map((m) => m.toAddress)).size).toBe(mail.length); // one each
    expect(mail.map((m) => m.toAddress)).not.toContain("mechanic@hangarline.test");
    expect(mail.map((m) => m.toAddress)).not.toContain("cottonwood.pilot@hangarline.test");
    expect(mail.every((m) => m.clubId === clubBySlug(CLUB).id && m.status === "pending")).toBe(true);
  });

  it("publishing to a type group reaches exactly the members checked out in it", async () => {
    signInAs("safety@hangarline.test");
    const id = await publish({ audience: "type_group", audienceTypeGroup: "fernwhistle f160", acknowledgeBy: "2099-01-31" });
    expect(bulletinMail(id).map((m) => m.toAddress).sort()).toEqual(["member@hangarline.test", "pilot2@hangarline.test"]);
    const row = db().select().from(bulletins).where(eq(bulletins.id, id)).get()!;
    expect(row).toMatchObject({ audienceTypeGroup: "Fernwhistle F160", acknowledgeBy: "2099-01-31", status: "published" }); // spelled as the fleet spells it
  });

  it("publishing to instructors reaches only instructors", async () => {
    signInAs("safety@hangarline.test");
    const id = await publish({ audience: "instructors" });
    expect(bulletinMail(id).map((m) => m.toAddress)).toEqual(["instructor@hangarline.test"]);
  });

  it("an acknowledgement is recorded once, however often it is sent", async () => {
    signInAs("safety@hangarline.test");
    const id = await publish({ audience: "type_group", audienceTypeGroup: "Fernwhistle F160" });
    signInAs("member@hangarline.test");
    const first = await acknowledgeBulletin(EMPTY, form({ club: CLUB, bulletinId: id }));
    const second = await acknowledgeBulletin(EMPTY, form({ club: CLUB, bulletinId: id }));
    expect(first).toMatchObject({ ok: true, message: "Acknowledged. Thank you." });
    expect(second.ok).toBe(true);
    expect(second.message).toMatch(/already acknowledged/);
    expect(db().select().from(bulletinAcknowledgements).where(eq(bulletinAcknowledgements.bulletinId, id)).all()).toHaveLength(1);

    signInAs("student@hangarline.test"); // not checked out in the group
    const outsider = await acknowledgeBulletin(EMPTY, form({ club: CLUB, bulletinId: id }));
    expect(outsider.ok).toBe(false);
    expect(outsider.message).toMatch(/addressed to others/);

    signInAs("safety@hangarline.test");
    const acks = await callRoute(acksRoute, `/api/clubs/${CLUB}/safety/bulletins/${id}/acknowledgements`, { club: CLUB, bulletinId: id });
    expect(acks.status).toBe(200);
    expect(acks.body).toMatchObject({ audience: 2, acknowledged: 1, outstanding: 1, percent: 50 });
  });

  it("the officer exports the list as CSV; admins read counts but cannot export; members neither", async () => {
    signInAs("safety@hangarline.test");
    const id = await publish({ audience: "type_group", audienceTypeGroup: "Fernwhistle F160", title: "Fuel, caps, \"seals\"" });
    const res = await exportRoute(new Request(`http://app.test/api/clubs/${CLUB}/safety/bulletins/${id}/acknowledgements/export`), { params: Promise.resolve({ club: CLUB, bulletinId: id }) });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/text\/csv/);
    const lines = (await res.text()).split("\r\n");
    expect(lines[0]).toBe("Bulletin,Version,Member,E-mail,Acknowledged,Acknowledged at (UTC),Deadline");
    expect(lines.filter((l) => l.includes("@hangarline.test"))).toHaveLength(2);
    expect(lines[1]).toMatch(/^"Fuel, caps, ""seals""",1,/);

    signInAs("admin@hangarline.test");
    expect((await callRoute(acksRoute, "/x", { club: CLUB, bulletinId: id })).status).toBe(200);
    expect((await callRoute(exportRoute, "/x", { club: CLUB, bulletinId: id })).status).toBe(403);
    signInAs("member@hangarline.test");
    expect((await callRoute(acksRoute, "/x", { club: CLUB, bulletinId: id })).status).toBe(403);
    signInAs("cottonwood.admin@hangarline.test"); // another club: the bulletin does not exist there
    expect((await callRoute(acksRoute, "/x", { club: "cottonwood-flyers", bulletinId: id })).status).toBe(404);
  });

  it("reminds only those who have not acknowledged, and not twice within the hour", async () => {
    signInAs("safety@hangarline.test");
    const id = await publish({ audience: "type_group", audienceTypeGroup: "Fernwhistle F160" });
    signInAs("pilot2@hangarline.test");
    await acknowledgeBulletin(EMPTY, form({ club: CLUB, bulletinId: id }));
    signInAs("safety@hangarline.test");
    const state = await remindBulletin(EMPTY, form({ club: CLUB, bulletinId: id }));
    expect(state).toMatchObject({ ok: true, message: "Reminder queued for 1 member." });
    const reminders = db().select().from(emailOutbox).where(eq(emailOutbox.template, "bulletin-reminder")).all().filter((m) => String((m.payload as { url: string }).url).endsWith(id));
    expect(reminders.map((m) => m.toAddress)).toEqual(["member@hangarline.test"]);
    expect((await remindBulletin(EMPTY, form({ club: CLUB, bulletinId: id }))).message).toMatch(/wait an hour/);
  });

  it("a revision is a new version; the published one is kept untouched and never edited", async () => {
    signInAs("safety@hangarline.test");
    const v1 = await publish({ title: "Oil caps", audience: "instructors" });
    const edit = await updateDraft(EMPTY, form({ club: CLUB, bulletinId: v1, title: "Changed", bodyMarkdown: body, urgency: "routine", audience: "everyone", intent: "draft" }));
    expect(edit.ok).toBe(false);
    expect(edit.message).toMatch(/cannot be edited; issue a revision/);
    const v2 = await publish({ title: "Oil caps (revised)", audience: "instructors", supersedesId: v1 });
    const [old, neu] = [v1, v2].map((id) => db().select().from(bulletins).where(eq(bulletins.id, id)).get()!);
    expect(old).toMatchObject({ title: "Oil caps", version: 1, supersededById: v2 });
    expect(old!.supersededAt).toBeInstanceOf(Date);
    expect(neu).toMatchObject({ title: "Oil caps (revised)", version: 2, seriesId: v1, supersedesId: v1 });
    expect(bulletinMail(v2)[0]!.payload).toMatchObject({ version: 2, supersedesVersion: 1 });
    signInAs("instructor@hangarline.test");
    expect((await acknowledgeBulletin(EMPTY, form({ club: CLUB, bulletinId: v1 }))).message).toMatch(/replaced/);
    signInAs("safety@hangarline.test");
    const third = await createBulletin(EMPTY, bulletinForm({ audience: "instructors", supersedesId: v1 }));
    expect(third.message).toMatch(/already been replaced/);
    // The database refuses it too, whatever code would try.
    expect(() => db().$client.prepare("update bulletins set body_markdown = 'changed' where id = ?").run(v1)).toThrow(/never edited/);
    expect(() => db().$client.prepare("delete from bulletins where id = ?").run(v2)).toThrow(/never deleted/);
    expect(db().select().from(bulletins).where(eq(bulletins.id, v1)).get()!.bodyMarkdown).toBe(body);
  });

  it("refuses bad input, a past deadline, a plain member and a fake attachment, writing nothing", async () => {
    const count = () => db().select().from(bulletins).all().length;
    const mail = () => db().select().from(emailOutbox).all().length;
    const files = () => db().select().from(uploads).all().length;
    const before = [count(), mail(), files()];
    signInAs("safety@hangarline.test");
    const bad = await createBulletin(EMPTY, form({ club: CLUB, title: "", bodyMarkdown: "", urgency: "loud", audience: "type_group", intent: "publish" }));
    expect(Object.keys(bad.fieldErrors).sort()).toEqual(["audienceTypeGroup", "bodyMarkdown", "title", "urgency"]);
    const past = await createBulletin(EMPTY, bulletinForm({ acknowledgeBy: "2001-01-01" }));
    expect(past.fieldErrors.acknowledgeBy).toEqual(["Choose today or a later date."]);
    const unknownGroup = await createBulletin(EMPTY, bulletinForm({ audience: "type_group", audienceTypeGroup: "Zeppelin" }));
    expect(unknownGroup.fieldErrors.audienceTypeGroup?.[0]).toMatch(/Choose one of: Brightwing BW-4, Fernwhistle F160, Larkspur L-2/);
    const fake = await createBulletin(EMPTY, bulletinForm({ attachment: fakePngFile() }));
    expect(fake.fieldErrors.attachment?.[0]).toMatch(/checked by its content/);
    signInAs("member@hangarline.test");
    const member = await createBulletin(EMPTY, bulletinForm());
    expect(member.ok).toBe(false);
    expect(member.message).toMatch(/permission/);
    expect([count(), mail(), files()]).toEqual(before);
  });
});
