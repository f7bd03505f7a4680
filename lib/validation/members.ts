import { z } from "zod";
import { ROLES } from "@/permissions/roles";
import { emailSchema } from "./auth";
import { recordId } from "./primitives";

export const roleSchema = z.enum(ROLES, { error: "Choose a role from the list." });

const rolesField = z
  .union([roleSchema, z.array(roleSchema)], { error: "Choose at least one role." })
  .transform((v) => [...new Set(Array.isArray(v) ? v : [v])])
  .refine((roles) => roles.length > 0, { error: "Choose at least one role." })
  .refine((roles) => !(roles.includes("mechanic") && roles.length > 1), {
    error: "A mechanic has records access only; give club roles to a member instead.",
  });

export const inviteMemberSchema = z.object({ email: emailSchema, roles: rolesField });

export const changeRolesSchema = z.object({ membershipId: recordId("Choose a member."), roles: rolesField });

export const membershipStatusSchema = z.object({
  membershipId: recordId("Choose a member."),
  status: z.enum(["active", "inactive"], { error: "Choose active or inactive." }),
});

export const revokeInvitationSchema = z.object({ invitationId: recordId("Choose an invitation.") });
