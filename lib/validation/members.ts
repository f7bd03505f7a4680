import { z } from "zod";
import { ROLES } from "@/permissions/roles";
import { emailSchema } from "./auth";

export const roleSchema = z.enum(ROLES, { error: "Choose a role from the list." });

const rolesField = z
  .union([roleSchema, z.array(roleSchema)], { error: "Choose at least one role." })
  .transform((v) => [...new Set(Array.isArray(v) ? v : [v])])
  .refine((roles) => roles.length > 0, { error: "Choose at least one role." })
  .refine((roles) => !(roles.includes("mechanic") && roles.length > 1), {
    error: "A mechanic has records access only; give club roles to a member instead.",
  });

export const inviteMemberSchema = z.object({ email: emailSchema, roles: rolesField });

export const changeRolesSchema = z.object({ membershipId: z.string().min(1), roles: rolesField });

export const membershipStatusSchema = z.object({
  membershipId: z.string().min(1),
  status: z.enum(["active", "inactive"]),
});

export const revokeInvitationSchema = z.object({ invitationId: z.string().min(1) });
