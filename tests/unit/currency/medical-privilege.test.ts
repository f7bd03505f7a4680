import { describe, expect, it } from "vitest";
import { medicalExpiry, medicalPrivilegeDates } from "@/lib/currency";

const UNDER_40 = "1990-08-20"; // 33 on 2024-05-10 (invented)
const OVER_40 = "1970-08-20"; // 53 on 2024-05-10 (invented)
const EXAM = "2024-05-10";

describe("medicalExpiry by privilege — 14 CFR 61.23(d)", () => {
  it("first class: ATP 12 months under 40, 6 months at 40 or over", () => {
    expect(medicalExpiry({ medicalClass: 1, examDate: EXAM, birthDate: UNDER_40, privilege: "atp" })).toBe("2025-05-31"); // 14 CFR 61.23(d)(1)(i)
    expect(medicalExpiry({ medicalClass: 1, examDate: EXAM, birthDate: OVER_40, privilege: "atp" })).toBe("2024-11-30"); // 14 CFR 61.23(d)(1)(ii)
  });

  it("first class: commercial 12 months at any age", () => {
    expect(medicalExpiry({ medicalClass: 1, examDate: EXAM, birthDate: UNDER_40, privilege: "commercial" })).toBe("2025-05-31"); // 14 CFR 61.23(d)(1)(iii)
    expect(medicalExpiry({ medicalClass: 1, examDate: EXAM, birthDate: OVER_40, privilege: "commercial" })).toBe("2025-05-31"); // 14 CFR 61.23(d)(1)(iii)
  });

  it("first class: private 60 months under 40, 24 at 40 or over (the default privilege)", () => {
    expect(medicalExpiry({ medicalClass: 1, examDate: EXAM, birthDate: UNDER_40, privilege: "private" })).toBe("2029-05-31"); // 14 CFR 61.23(d)(1)(iv)
    expect(medicalExpiry({ medicalClass: 1, examDate: EXAM, birthDate: OVER_40 })).toBe("2026-05-31"); // 14 CFR 61.23(d)(1)(v)
  });

  it("second class: commercial 12 months, private 60 / 24, never ATP", () => {
    expect(medicalExpiry({ medicalClass: 2, examDate: EXAM, birthDate: OVER_40, privilege: "commercial" })).toBe("2025-05-31"); // 14 CFR 61.23(d)(2)(i)
    expect(medicalExpiry({ medicalClass: 2, examDate: EXAM, birthDate: UNDER_40, privilege: "private" })).toBe("2029-05-31"); // 14 CFR 61.23(d)(2)(ii)
    expect(medicalExpiry({ medicalClass: 2, examDate: EXAM, birthDate: OVER_40, privilege: "private" })).toBe("2026-05-31"); // 14 CFR 61.23(d)(2)(iii)
    expect(medicalExpiry({ medicalClass: 2, examDate: EXAM, birthDate: UNDER_40, privilege: "atp" })).toBeNull(); // 14 CFR 61.23(a)(1): ATP needs first class
  });

  it("third class: private only", () => {
    expect(medicalExpiry({ medicalClass: 3, examDate: EXAM, birthDate: UNDER_40, privilege: "private" })).toBe("2029-05-31"); // 14 CFR 61.23(d)(3)(i)
    expect(medicalExpiry({ medicalClass: 3, examDate: EXAM, birthDate: OVER_40, privilege: "private" })).toBe("2026-05-31"); // 14 CFR 61.23(d)(3)(ii)
    expect(medicalExpiry({ medicalClass: 3, examDate: EXAM, birthDate: UNDER_40, privilege: "commercial" })).toBeNull(); // 14 CFR 61.23(a)(2): commercial needs second class
    expect(medicalExpiry({ medicalClass: 3, examDate: EXAM, birthDate: UNDER_40, privilege: "atp" })).toBeNull(); // 14 CFR 61.23(a)(1)
  });

  it("takes the age on the exam date: 40 on the exam day is '40 or over'", () => {
    expect(medicalExpiry({ medicalClass: 1, examDate: EXAM, birthDate: "1984-05-10", privilege: "atp" })).toBe("2024-11-30"); // 14 CFR 61.23(d)(1)(ii)
    expect(medicalExpiry({ medicalClass: 1, examDate: EXAM, birthDate: "1984-05-11", privilege: "atp" })).toBe("2025-05-31"); // 14 CFR 61.23(d)(1)(i)
  });

  it("ends on the last day of a calendar month, across a short month", () => {
    // 14 CFR 61.23(d): "the end of the last day of the ... month after the month of the date of examination"
    expect(medicalExpiry({ medicalClass: 1, examDate: "2024-08-31", birthDate: OVER_40, privilege: "atp" })).toBe("2025-02-28");
    expect(medicalExpiry({ medicalClass: 1, examDate: "2023-08-01", birthDate: OVER_40, privilege: "atp" })).toBe("2024-02-29"); // 2024 is a leap year
  });

  it("lists every privilege the class carries, highest first", () => {
    // 14 CFR 61.23(d)(1)(ii), (iii), (v)
    expect(medicalPrivilegeDates({ medicalClass: 1, examDate: EXAM, birthDate: OVER_40 })).toEqual([
      { privilege: "atp", lastDay: "2024-11-30" },
      { privilege: "commercial", lastDay: "2025-05-31" },
      { privilege: "private", lastDay: "2026-05-31" },
    ]);
    // 14 CFR 61.23(d)(3)(i)
    expect(medicalPrivilegeDates({ medicalClass: 3, examDate: EXAM, birthDate: UNDER_40 })).toEqual([{ privilege: "private", lastDay: "2029-05-31" }]);
  });
});
