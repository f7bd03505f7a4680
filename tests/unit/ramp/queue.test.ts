// Ramp mode's queue rules (lib/ramp/queue.ts) and which pages are kept (lib/ramp/pages.ts).
// No trade computation here: the expected values are this product's own wording and rules.
import { describe, expect, it } from "vitest";
import { isRampPage, isSignedOutPath, pageCacheKey } from "@/lib/ramp/pages";
import { classifyAnswer, classifyFailure, fieldsToObject, newQueuedWrite, rebuildFormData, retryDelayMs, sentMessage, toSend, toStoredFields, waitingMessage, type QueuedWrite } from "@/lib/ramp/queue";

const KEY = "5d0c1f8e-3a4b-4c2d-9e8f-0a1b2c3d4e5f";

function squawkForm(description = "Oil on the lower cowling after the run-up"): FormData {
  const fd = new FormData();
  fd.append("idempotencyKey", KEY);
  fd.append("club", "cottonwood-flyers");
  fd.append("aircraftId", "ac_1");
  fd.append("description", description);
  fd.append("foundDuring", "preflight");
  fd.append("photos", new File([new Uint8Array([0x89, 0x50, 0x4e, 0x47])], "cowling.png", { type: "image/png" }));
  fd.append("photos", new File([new Uint8Array([1, 2, 3])], "belly.png", { type: "image/png" }));
  return fd;
}

function entry(over: Partial<QueuedWrite> = {}): QueuedWrite {
  return { id: KEY, kind: "squawk", userId: "u1", createdAt: 1_000, summary: "Oil on the cowling", fields: [], state: "waiting", ...over };
}

describe("keeping a submission", () => {
  it("keeps the form's own idempotency key, its text and its photos as Blobs with their names", async () => {
    const kept = newQueuedWrite({ kind: "squawk", userId: "u1", fields: toStoredFields(squawkForm().entries()), now: 42, makeKey: () => "never-used" });
    expect(kept.id).toBe(KEY);
    expect(kept.summary).toBe("Oil on the lower cowling after the run-up");
    expect(kept.state).toBe("waiting");
    const files = kept.fields.filter((f) => f.kind === "file");
    expect(files.map((f) => (f.kind === "file" ? [f.fileName, f.type, f.blob.size] : null))).toEqual([["cowling.png", "image/png", 4], ["belly.png", "image/png", 3]]);
  });

  it("makes a key only when the form had none yet, and puts it in the fields the server reads", () => {
    const fd = squawkForm();
    fd.set("idempotencyKey", "");
    const kept = newQueuedWrite({ kind: "squawk", userId: "u1", fields: toStoredFields(fd.entries()), now: 42, makeKey: () => "made-here-0001-0002" });
    expect(kept.id).toBe("made-here-0001-0002");
    expect(kept.fields.filter((f) => f.name === "idempotencyKey")).toEqual([{ name: "idempotencyKey", kind: "text", value: "made-here-0001-0002" }]);
  });

  it("rebuilds the same FormData: same fields in order, the same key, files with names, types and bytes", async () => {
    const original = squawkForm();
    const rebuilt = rebuildFormData(toStoredFields(original.entries()));
    expect([...rebuilt.keys()]).toEqual([...original.keys()]);
    expect(rebuilt.get("idempotencyKey")).toBe(KEY);
    const photos = rebuilt.getAll("photos") as File[];
    expect(photos.map((p) => [p.name, p.type, p.size])).toEqual([["cowling.png", "image/png", 4], ["belly.png", "image/png", 3]]);
    expect([...new Uint8Array(await photos[0]!.arrayBuffer())]).toEqual([0x89, 0x50, 0x4e, 0x47]);
  });

  it("reads fields as the action wrapper does: repeated names and name[] become lists", () => {
    const fd = new FormData();
    fd.append("fuelTank[]", "Left");
    fd.append("fuelTank[]", "Right");
    fd.append("oilQuantity", "6");
    fd.append("__proto__", "x");
    expect(fieldsToObject(toStoredFields(fd.entries()))).toEqual({ fuelTank: ["Left", "Right"], oilQuantity: "6" });
  });
});

describe("what is sent, and for whom", () => {
  it("sends only the signed-in person's waiting entries, oldest first; a refused one is not resent", () => {
    const list = [entry({ id: "c", createdAt: 3 }), entry({ id: "a", createdAt: 1 }), entry({ id: "x", userId: "u2", createdAt: 0 }), entry({ id: "r", createdAt: 0, state: "refused" }), entry({ id: "b", createdAt: 2, kind: "preflight" })];
    expect(toSend(list, "u1").map((e) => e.id)).toEqual(["a", "b", "c"]);
    expect(toSend(list, "u2").map((e) => e.id)).toEqual(["x"]);
  });

  it("says how many wait, per kind, in words", () => {
    expect(waitingMessage([entry()], "u1")).toBe("1 squawk not sent yet — it will be sent when you have signal.");
    expect(waitingMessage([entry({ id: "a" }), entry({ id: "b" })], "u1")).toBe("2 squawks not sent yet — they will be sent when you have signal.");
    expect(waitingMessage([entry({ id: "a" }), entry({ id: "b", kind: "preflight" })], "u1")).toBe("1 squawk and 1 preflight record not sent yet — they will be sent when you have signal.");
    expect(waitingMessage([entry({ userId: "u2" })], "u1")).toBeNull();
    expect(waitingMessage([entry({ state: "refused" })], "u1")).toBeNull();
  });

  it("confirms by quoting the squawk", () => {
    expect(sentMessage({ kind: "squawk", summary: "Oil on the cowling" })).toBe("Squawk sent: “Oil on the cowling”");
    expect(sentMessage({ kind: "preflight", summary: "Preflight record" })).toBe("Preflight record sent.");
  });
});

describe("reading the answer", () => {
  it("an ok answer is sent; a refusal is kept as refused with its reason", () => {
    expect(classifyAnswer({ ok: true, message: "Squawk reported." })).toEqual({ kind: "sent" });
    expect(classifyAnswer({ ok: false, message: "That aircraft was not found in this club." })).toEqual({ kind: "refused", reason: "That aircraft was not found in this club." });
  });

  it("an ended session is not a refusal of the record: it waits for the next sign-in", () => {
    expect(classifyAnswer({ ok: false, message: "Your session has ended. Sign in again." }).kind).toBe("retry");
  });

  it("a missing or unreadable answer is tried again, never dropped", () => {
    expect(classifyAnswer(undefined).kind).toBe("retry");
    expect(classifyAnswer({} as { ok: boolean }).kind).toBe("retry");
  });

  it("the framework's redirect signal means the write was accepted; no signal and other failures are retried", () => {
    expect(classifyFailure(Object.assign(new Error("NEXT_REDIRECT"), { digest: "NEXT_REDIRECT;push;/clubs/x/aircraft/y?reported=z;307;" }))).toEqual({ kind: "sent" });
    expect(classifyFailure(new TypeError("Failed to fetch")).kind).toBe("retry");
    expect(classifyFailure(new Error("An unexpected response was received from the server.")).kind).toBe("retry");
  });
});

describe("trying again with one bar", () => {
  it("15 s, 30 s, 1 min, then every 2 min (our own choice)", () => {
    expect([0, 1, 2, 3, 4, 50].map(retryDelayMs)).toEqual([15_000, 30_000, 60_000, 120_000, 120_000, 120_000]);
    expect(retryDelayMs(-1)).toBe(15_000);
  });
});

describe("which pages are kept", () => {
  it("the flight line, an aircraft's page, a booking's preflight and weight and balance", () => {
    for (const p of ["/clubs/cottonwood-flyers/flight-line", "/clubs/cottonwood-flyers/aircraft/ac_12", "/clubs/c/bookings/bk_1/preflight", "/clubs/c/bookings/bk_1/weight-balance", "/clubs/c/flight-line/"]) expect(isRampPage(p), p).toBe(true);
  });

  it("nothing with money, members or API answers, and no other page", () => {
    for (const p of ["/clubs/c/money", "/clubs/c/account", "/clubs/c/members", "/clubs/c/bookings/bk_1", "/clubs/c/bookings/bk_1/flight-sheet", "/api/clubs/c/flight-line", "/clubs/c/aircraft", "/clubs/c/aircraft/a/b", "/sign-in"]) expect(isRampPage(p), p).toBe(false);
  });

  it("keys a page by its path alone, only on our origin", () => {
    const origin = "https://hangarline.example";
    expect(pageCacheKey("/clubs/c/aircraft/a1?reported=s1", origin)).toBe(`${origin}/clubs/c/aircraft/a1`);
    expect(pageCacheKey(`${origin}/clubs/c/flight-line/`, origin)).toBe(`${origin}/clubs/c/flight-line`);
    expect(pageCacheKey("https://elsewhere.example/clubs/c/flight-line", origin)).toBeNull();
    expect(pageCacheKey("/clubs/c/money", origin)).toBeNull();
  });

  it("the sign-in pages mean nobody's pages may stay", () => {
    expect(isSignedOutPath("/sign-in")).toBe(true);
    expect(isSignedOutPath("/sign-in/check-email")).toBe(true);
    expect(isSignedOutPath("/sign-inside")).toBe(false);
  });
});
