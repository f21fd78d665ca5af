// The shop lead's people (/api/users), each person's own units, and the one-time password links.
import { z } from "zod";
import { unitSystems } from "../equipment.ts";
import { passwordSchema } from "./auth.ts";
import { publicUserSchema, roles } from "./users.ts";

const emailField = z
  .string({ error: "Enter an e-mail address." })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: "Enter an e-mail address, for example name@shop.example." }).max(254, { error: "Use at most 254 characters." }));

const roleField = z.enum(roles, { error: "Choose a role." });

/** Where a person stands: invited (no password yet), active, or deactivated by the shop lead. */
export const personStatuses = ["invited", "active", "deactivated"] as const;
export type PersonStatus = (typeof personStatuses)[number];

export const personSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: z.enum(roles),
  active: z.boolean(),
  status: z.enum(personStatuses),
  unitSystem: z.enum(unitSystems),
  invitedAt: z.string().nullable(),
  joinedAt: z.string().nullable(),
  lastSignInAt: z.string().nullable(),
  /** When the newest invitation link stops working (only while invited). */
  inviteExpiresAt: z.string().nullable(),
});
export type Person = z.infer<typeof personSchema>;

/** GET /api/users */
export const peopleResponseSchema = z.object({ people: z.array(personSchema) });

/** How the e-mail with a link went. */
export const linkMailSchema = z.object({ status: z.enum(["sent", "failed"]), error: z.string().nullable() });
export type LinkMail = z.infer<typeof linkMailSchema>;

/** POST /api/users/invites */
export const inviteRequestSchema = z.object({
  email: emailField,
  name: z.string({ error: "Enter their name." }).trim().min(1, { error: "Enter their name." }).max(120, { error: "Use at most 120 characters." }),
  role: roleField,
});
export type InviteRequest = z.input<typeof inviteRequestSchema>;

/** POST /api/users/invites and POST /api/users/:id/invites */
export const inviteResponseSchema = z.object({ person: personSchema, mail: linkMailSchema });
export type InviteResponse = z.infer<typeof inviteResponseSchema>;

export const userIdParamsSchema = z.object({ id: z.uuid({ error: "Not a user id." }) });

/** PATCH /api/users/:id — a new role, or deactivate / reactivate. */
export const updatePersonRequestSchema = z
  .object({ role: roleField.optional(), active: z.boolean({ error: "active is true or false." }).optional() })
  .strict()
  .refine((v) => v.role !== undefined || v.active !== undefined, { error: "Give a role or active." });
export type UpdatePersonRequest = z.input<typeof updatePersonRequestSchema>;

/** PATCH /api/users/:id */
export const updatePersonResponseSchema = z.object({ person: personSchema });

/** PUT /api/auth/me/units — the signed-in person's own choice. */
export const unitChoiceRequestSchema = z.object({ unitSystem: z.enum(unitSystems, { error: "Choose imperial or metric." }) });
export type UnitChoiceRequest = z.input<typeof unitChoiceRequestSchema>;
export const unitChoiceResponseSchema = z.object({ user: publicUserSchema });

/** POST /api/auth/password-resets — always answered 202. */
export const passwordResetRequestSchema = z.object({ email: emailField });
export type PasswordResetRequest = z.input<typeof passwordResetRequestSchema>;

export const linkTokenParamsSchema = z.object({ token: z.string().regex(/^[A-Za-z0-9_-]{20,128}$/, { error: "That is not a link Benchpath sent." }) });

/** GET /api/public/password-links/:token — what the link is for and whose it is, nothing more. */
export const passwordLinkSchema = z.object({ purpose: z.enum(["invite", "password_reset"]), name: z.string(), expiresAt: z.string() });
export type PasswordLink = z.infer<typeof passwordLinkSchema>;

/** POST /api/public/password-links/:token */
export const setPasswordRequestSchema = z.object({ password: passwordSchema });
export type SetPasswordRequest = z.input<typeof setPasswordRequestSchema>;
export const setPasswordResponseSchema = z.object({ purpose: z.enum(["invite", "password_reset"]), email: z.string() });

/** Client-side form for the password pages: the second copy must match. */
export const newPasswordFormSchema = z
  .object({ password: passwordSchema, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], error: "The two passwords are not the same." });

/** How long a link works. */
export const INVITE_VALID_DAYS = 7;
export const RESET_VALID_MINUTES = 60;
