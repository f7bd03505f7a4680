// A booking's accepted warnings name the member's own standing (medical, arrears). The booking
// API and the booking page give them to the booking's member, the instructor on that booking,
// and roles that read that kind of data for every member; everyone else gets the booking
// without them.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { GET as bookingApi } from "@/app/api/clubs/[club]/bookings/[bookingId]/route";
import BookingPage from "@/app/clubs/[club]/bookings/[bookingId]/page";
import { bookings, users } from "@/db/schema";
import { params, treeText } from "./authz-helpers";
import { planeId, seedScenario } from "./bookings-helpers";
import { clubBySlug, db, signInAs } from "./helpers";

const CLUB = "reedwater";
const uid = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;
const MEDICAL = "pilot2 has no medical certificate on record (14 CFR 61.23).";
const ARREARS = "pilot2's account is overdue: $180.00 owed, unpaid since 2026-01-01.";
let bookingId = "";

beforeAll(async () => {
  await seedScenario();
  // Far enough ahead to clash with no demo booking.
  const startsAt = new Date(Date.now() + 300 * 86_400_000);
  startsAt.setUTCHours(3, 0, 0, 0);
  const [row] = db()
    .insert(bookings)
    .values({
      clubId: clubBySlug(CLUB).id, aircraftId: planeId(CLUB, "N0527L"), userId: uid("pilot2@hangarline.test"), instructorId: uid("instructor@hangarline.test"),
      startsAt, endsAt: new Date(startsAt.getTime() + 2 * 3_600_000), createdById: uid("pilot2@hangarline.test"),
      acceptedWarnings: [{ guard: "medicalExpired", reason: MEDICAL }, { guard: "inArrears", reason: ARREARS }],
    })
    .returning({ id: bookings.id })
    .all();
  bookingId = row!.id;
});

async function apiAs(email: string) {
  signInAs(email);
  const res = await bookingApi(new Request(`http://app.test/api/clubs/${CLUB}/bookings/${bookingId}`), params({ club: CLUB, bookingId }));
  expect(res.status).toBe(200);
  const text = await res.text();
  return { text, warnings: (JSON.parse(text) as { data: { acceptedWarnings: { guard: string }[] } }).data.acceptedWarnings.map((w) => w.guard) };
}

describe("booking warnings in the booking API", () => {
  it("another member gets the booking without any warning", async () => {
    for (const who of ["member@hangarline.test", "student@hangarline.test", "maintenance@hangarline.test"]) {
      const { text, warnings } = await apiAs(who);
      expect(warnings, who).toEqual([]);
      expect(text, who).not.toContain("medical");
      expect(text, who).not.toContain("$180.00"); // the member's money, in any words
      expect(text, who).toContain("N0527L"); // the booking itself is still there
    }
  });

  it("the booking's member sees both; the instructor on it the flying warning, never the member's money", async () => {
    expect((await apiAs("pilot2@hangarline.test")).warnings).toEqual(["medicalExpired", "inArrears"]);
    expect((await apiAs("instructor@hangarline.test")).warnings).toEqual(["medicalExpired"]);
  });

  it("the safety officer sees the medical warning, the treasurer the arrears, an admin both", async () => {
    expect((await apiAs("safety@hangarline.test")).warnings).toEqual(["medicalExpired"]);
    expect((await apiAs("treasurer@hangarline.test")).warnings).toEqual(["inArrears"]);
    expect((await apiAs("admin@hangarline.test")).warnings).toEqual(["medicalExpired", "inArrears"]);
  });
});

describe("booking warnings on the booking page", () => {
  it("are handed on only to those who may read them", async () => {
    signInAs("member@hangarline.test");
    const other = treeText(await BookingPage(params({ club: CLUB, bookingId })));
    expect(other).toContain("N0527L");
    expect(other).not.toContain(MEDICAL);
    expect(other).not.toContain(ARREARS);
    signInAs("pilot2@hangarline.test");
    const own = treeText(await BookingPage(params({ club: CLUB, bookingId })));
    expect(own).toContain(MEDICAL);
    expect(own).toContain(ARREARS);
    signInAs("safety@hangarline.test");
    const safety = treeText(await BookingPage(params({ club: CLUB, bookingId })));
    expect(safety).toContain(MEDICAL);
    expect(safety).not.toContain(ARREARS);
  });
});
