import { z } from "zod";
import { isValidTimeZone } from "@/lib/dates";
import { emailSchema } from "./auth";
import { recordId } from "./primitives";

export const CURRENCIES = ["USD", "EUR", "CAD", "GBP", "AUD", "NZD", "CHF"] as const;

export const slugSchema = z
  .string()
  .trim()
  .toLowerCase()
  .min(3, { error: "Use 3 to 40 characters for the web address." })
  .max(40, { error: "Use 3 to 40 characters for the web address." })
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, { error: "Use lower-case letters, digits and single hyphens, like pine-valley-flyers." })
  .refine((s) => !["new", "api", "admin", "operator"].includes(s), { error: "That address is reserved." });

export const createClubSchema = z.object({
  name: z.string().trim().min(2, { error: "Enter the club's name." }).max(120),
  slug: slugSchema,
  timeZone: z.string().trim().refine(isValidTimeZone, { error: "Choose a time zone from the list (for example America/Chicago)." }),
  currency: z.enum(CURRENCIES, { error: "Choose the currency the club bills in." }),
  unitSystem: z.enum(["imperial", "metric"], { error: "Choose US units (gallons, pounds) or metric (litres, kilograms)." }),
  adminEmail: emailSchema,
});

export const assignAdminSchema = z.object({ clubId: recordId("Choose a club."), adminEmail: emailSchema });
