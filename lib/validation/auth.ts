import { z } from "zod";

export const emailSchema = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .toLowerCase()
  .max(254, { error: "Enter a valid e-mail address, like name@example.com." })
  .pipe(z.email({ error: "Enter a valid e-mail address, like name@example.com." }));

export const passwordSignInSchema = z.object({
  email: emailSchema,
  password: z.string({ error: "Enter your password." }).min(1, { error: "Enter your password." }).max(200),
  callbackUrl: z.string().max(2000).optional(),
});

export const newPasswordSchema = z
  .string({ error: "Choose a password." })
  .min(10, { error: "Use at least 10 characters for your password." })
  .max(200, { error: "Use at most 200 characters." });

export const magicLinkSchema = z.object({ email: emailSchema, callbackUrl: z.string().max(2000).optional() });

export const acceptInvitationSchema = z.object({
  token: z.string().min(20).max(200),
  name: z.string().trim().min(1, { error: "Enter your name." }).max(120).optional(),
  password: newPasswordSchema.optional(),
});

/** Only same-site relative paths are followed after sign-in. */
export function safeCallbackUrl(value: string | undefined | null): string {
  if (!value || !value.startsWith("/") || value.startsWith("//") || value.includes("\\")) return "/";
  return value;
}
