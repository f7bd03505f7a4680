// Money that arrives is never refused because its day is in a reconciled, locked period: a card
// payment (as the payments webhook records it), a cheque recorded by the treasurer, and a card
// refund post on the first open day, their memo naming the original day; the member is credited.
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { journalEntries, payments, users } from "@/db/schema";
import { recordManualPayment } from "@/lib/actions/money/record-manual-payment";
import { memberBalance } from "@/db/queries/money-member-balances";
import { recordCardPayment, recordCardRefund } from "@/db/queries/money-card-payments";
import { addDays, isoDateInTimeZone } from "@/lib/dates";
import { EMPTY, clubBySlug, db, form, signInAs } from "./helpers";
import { lockBooksThrough } from "./books-helpers";
import { seedScenario } from "./bookings-helpers";

const SLUG = "reedwater";
const uid = (email: string) => db().select().from(users).where(eq(users.email, email)).get()!.id;

describe("money dated in a locked period", () => {
  let today = "";
  let lockedEnd = "";
  beforeAll(async () => {
    await seedScenario();
    const club = clubBySlug(SLUG);
    today = isoDateInTimeZone(new Date(), club.timeZone);
    lockedEnd = addDays(today, -5);
    lockBooksThrough(club.id, addDays(today, -35), lockedEnd);
  });

  it("a card payment paid inside the locked period posts on the first open day and credits the member", () => {
    const club = clubBySlug(SLUG);
    const member = uid("member@hangarline.test");
    const before = memberBalance(db(), club.id, member);
    const paidAt = new Date(Date.now() - 10 * 86_400_000);
    const outcome = db().transaction((tx) => recordCardPayment(tx, {
      clubId: club.id, memberUserId: member, paymentId: null, checkoutSessionId: "cs_test_locked", paymentIntentId: "pi_test_locked_1", chargeId: "ch_test_locked_1",
      status: "succeeded", amountMinor: 12_345, feeMinor: 388, currency: "usd", paidAt, lastError: null,
    }));
    expect(outcome).toBe("posted");
    const payment = db().select().from(payments).where(eq(payments.paymentIntentId, "pi_test_locked_1")).get()!;
    const entry = db().select().from(journalEntries).where(eq(journalEntries.id, payment.journalEntryId!)).get()!;
    const paidOn = isoDateInTimeZone(paidAt, club.timeZone);
    expect(payment.receivedOn).toBe(paidOn);
    expect(entry.entryDate).toBe(addDays(lockedEnd, 1));
    expect(entry.memo).toContain(`dated ${paidOn}, in a locked period`);
    // The member's balance falls by the payment's gross amount (the fee is the club's).
    expect(memberBalance(db(), club.id, member)).toBe(before - 12_345);

    // The provider's refund of it, dated inside the lock too, is not refused either.
    db().transaction((tx) => recordCardRefund(tx, { clubId: club.id, paymentIntentId: "pi_test_locked_1", refundId: "re_test_locked_1", amountMinor: 2_000, currency: "usd", treatment: "reopen", createdAt: paidAt }));
    const refund = db().select().from(journalEntries).all().find((e) => e.kind === "card-refund" && e.memo.includes("locked period"));
    expect(refund?.entryDate).toBe(addDays(lockedEnd, 1));
  });

  it("a cheque received inside the locked period is recorded, posted on the first open day, and the treasurer is told", async () => {
    signInAs("treasurer@hangarline.test");
    const club = clubBySlug(SLUG);
    const member = uid("pilot2@hangarline.test");
    const before = memberBalance(db(), club.id, member);
    const receivedOn = addDays(today, -12);
    const state = await recordManualPayment(EMPTY, form({ club: SLUG, memberUserId: member, method: "cheque", amount: "80.00", receivedOn, reference: "0042", idempotencyKey: crypto.randomUUID() }));
    expect(state, state.message).toMatchObject({ ok: true });
    expect(state.message).toMatch(new RegExp(`${receivedOn} is in a locked period, so it was posted on ${addDays(lockedEnd, 1)}`));
    const entry = db().select().from(journalEntries).all().find((e) => e.kind === "manual-payment" && e.memo.startsWith("Cheque payment 0042"))!;
    expect(entry.entryDate).toBe(addDays(lockedEnd, 1));
    expect(entry.memo).toContain(`dated ${receivedOn}`);
    expect(memberBalance(db(), club.id, member)).toBe(before - 8_000);
  });
});
