import { z } from "zod";
import { publicUserSchema } from "./users.ts";

export const signInRequestSchema = z.object({
  email: z
    .string({ error: "Enter your e-mail address." })
    .trim()
    .toLowerCase()
    .pipe(z.email({ error: "Enter your e-mail address, for example name@shop.example." }).max(254)),
  password: z.string().min(1, { error: "Enter your password." }).max(200, { error: "That password is too long." }),
});
export type SignInRequest = z.input<typeof signInRequestSchema>;

export const meResponseSchema = z.object({ user: publicUserSchema, shop: z.object({ name: z.string() }) });
export type MeResponse = z.infer<typeof meResponseSchema>;

export const passwordSchema = z
  .string()
  .min(12, { error: "Use at least 12 characters." })
  .max(200, { error: "Use at most 200 characters." });

export const changePasswordRequestSchema = z.object({
  currentPassword: z.string().min(1, { error: "Enter your current password." }).max(200),
  newPassword: passwordSchema,
});
export type ChangePasswordRequest = z.input<typeof changePasswordRequestSchema>;
