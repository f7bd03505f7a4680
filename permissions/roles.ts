// Roles a person holds in one club. "mechanic" gives maintenance access to the aircraft records
// without club membership (no roster, money or safety reports).
export const ROLES = ["member", "instructor", "safety", "treasurer", "maintenance", "admin", "mechanic"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  member: "Member",
  instructor: "Instructor",
  safety: "Safety officer",
  treasurer: "Treasurer",
  maintenance: "Maintenance officer",
  admin: "Club admin",
  mechanic: "Mechanic (records only)",
};

export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  member: "Books and flies club aircraft, reports squawks, pays dues.",
  instructor: "Checks members out in a type and signs flight reviews.",
  safety: "Publishes bulletins, reads safety reports, can ground an aircraft.",
  treasurer: "Bills, collects, reconciles and sets rates.",
  maintenance: "Tracks inspections, triages squawks, returns aircraft to service.",
  admin: "Admits members and assigns roles.",
  mechanic: "Sees and signs off the aircraft records of this club only.",
};

export function isRole(value: string): value is Role {
  return (ROLES as readonly string[]).includes(value);
}
