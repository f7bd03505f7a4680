import { describe, expect, it } from "vitest";
import { ageOn, basicMedStatus, documentExpiryStatus, flightReviewDue, medicalExpiry } from "@/lib/currency";

describe("flightReviewDue — 14 CFR 61.56(c)", () => {
  it("runs to the end of the 24th calendar month after the review month", () => {
    // 14 CFR 61.56(c): "since the beginning of the 24th calendar month before the month…"
    expect(flightReviewDue("2024-03-15")).toBe("2026-03-31");
    expect(flightReviewDue("2024-03-01")).toBe("2026-03-31"); // 14 CFR 61.56(c): day of month irrelevant
    expect(flightReviewDue("2024-12-31")).toBe("2026-12-31"); // 14 CFR 61.56(c)
    expect(flightReviewDue("2022-02-01")).toBe("2024-02-29"); // 14 CFR 61.56(c); 2024 leap year (Gregorian rule)
    expect(flightReviewDue("2023-02-10")).toBe("2025-02-28"); // 14 CFR 61.56(c)
  });
});

describe("ageOn", () => {
  it("counts the birthday itself and not the day before", () => {
    expect(ageOn("1984-05-10", "2024-05-10")).toBe(40); // own arithmetic
    expect(ageOn("1984-05-10", "2024-05-09")).toBe(39); // own arithmetic
  });
  it("moves a 29 February birthday to 1 March in a common year (our convention)", () => {
    expect(ageOn("1984-02-29", "2025-02-28")).toBe(40); // documented convention, own arithmetic
    expect(ageOn("1984-02-29", "2025-03-01")).toBe(41); // documented convention, own arithmetic
    expect(ageOn("1984-02-29", "2024-02-29")).toBe(40); // own arithmetic
  });
  it("refuses an exam before birth", () => {
    expect(() => ageOn("2000-01-01", "1999-12-31")).toThrow(RangeError);
  });
});

describe("medicalExpiry — 14 CFR 61.23(d), private-pilot privileges", () => {
  it("gives 60 calendar months when under 40 on the exam date", () => {
    // 14 CFR 61.23(d): under 40 → end of the 60th month after the exam month
    expect(medicalExpiry({ medicalClass: 3, examDate: "2024-05-10", birthDate: "1990-08-20" })).toBe("2029-05-31");
    expect(medicalExpiry({ medicalClass: 3, examDate: "2024-01-31", birthDate: "1990-08-20" })).toBe("2029-01-31");
  });

  it("gives 24 calendar months when 40 or older on the exam date", () => {
    // 14 CFR 61.23(d): 40 or older → end of the 24th month after the exam month
    expect(medicalExpiry({ medicalClass: 3, examDate: "2024-05-10", birthDate: "1980-01-15" })).toBe("2026-05-31");
  });

  it("treats turning 40 on the exam day as 40", () => {
    // 14 CFR 61.23(d): age is taken on the exam date
    expect(medicalExpiry({ medicalClass: 3, examDate: "2024-05-10", birthDate: "1984-05-10" })).toBe("2026-05-31");
  });

  it("treats a birthday later in the exam month as still under 40", () => {
    // 14 CFR 61.23(d): 40th birthday 2024-05-20 falls after the 2024-05-10 exam → 60 months
    expect(medicalExpiry({ medicalClass: 3, examDate: "2024-05-10", birthDate: "1984-05-20" })).toBe("2029-05-31");
    // the day before the exam: already 40 → 24 months
    expect(medicalExpiry({ medicalClass: 3, examDate: "2024-05-10", birthDate: "1984-05-09" })).toBe("2026-05-31");
  });

  it("handles 29 February births and exams", () => {
    // 14 CFR 61.23(d): born 1984-02-29, exam 2024-02-28 → 39 → 60 months, ends in a common February
    expect(medicalExpiry({ medicalClass: 3, examDate: "2024-02-28", birthDate: "1984-02-29" })).toBe("2029-02-28");
    // 14 CFR 61.23(d): exam on the 40th birthday 2024-02-29 → 24 months
    expect(medicalExpiry({ medicalClass: 3, examDate: "2024-02-29", birthDate: "1984-02-29" })).toBe("2026-02-28");
  });

  it("does not depend on the class for private privileges", () => {
    // 14 CFR 61.23(d): first- and second-class revert to third-class privileges with the same end
    for (const medicalClass of [1, 2, 3] as const) {
      expect(medicalExpiry({ medicalClass, examDate: "2024-05-10", birthDate: "1990-08-20" })).toBe("2029-05-31");
      expect(medicalExpiry({ medicalClass, examDate: "2024-05-10", birthDate: "1970-08-20" })).toBe("2026-05-31");
    }
  });
});

describe("basicMedStatus — 14 CFR 61.23(c)(3), 61.113(i) (second-hand wording)", () => {
  it("takes the earlier of the course and exam limits", () => {
    // course: 24 calendar months → 2025-04-30; exam: 48 months to the day → 2026-03-31 (own arithmetic)
    const s = basicMedStatus({ courseDate: "2023-04-12", examDate: "2022-03-31" }, "2025-04-30");
    expect(s).toEqual({ current: true, courseDue: "2025-04-30", examDue: "2026-03-31", lastDay: "2025-04-30" });
    expect(basicMedStatus({ courseDate: "2023-04-12", examDate: "2022-03-31" }, "2025-05-01").current).toBe(false);
  });
  it("counts the 48 months to the day", () => {
    // own arithmetic: 2020-02-29 + 48 months = 2024-02-29; 2021-02-28 + 48 months = 2025-02-28
    expect(basicMedStatus({ courseDate: "2024-01-10", examDate: "2020-02-29" }, "2024-03-01").examDue).toBe("2024-02-29");
    expect(basicMedStatus({ courseDate: "2024-01-10", examDate: "2020-02-29" }, "2024-03-01").current).toBe(false);
  });
});

describe("documentExpiryStatus", () => {
  it("warns inside the club's reminder window and expires the day after the last valid day", () => {
    // club setting, e.g. 30 days (own arithmetic on the day counts)
    expect(documentExpiryStatus("2025-06-30", "2025-05-30", 30)).toBe("valid"); // 31 days left
    expect(documentExpiryStatus("2025-06-30", "2025-05-31", 30)).toBe("expiring"); // 30 days left
    expect(documentExpiryStatus("2025-06-30", "2025-06-30", 30)).toBe("expiring"); // last valid day
    expect(documentExpiryStatus("2025-06-30", "2025-07-01", 30)).toBe("expired");
    expect(documentExpiryStatus("2025-06-30", "2025-06-30", 0)).toBe("expiring");
  });
});
