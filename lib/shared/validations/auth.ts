import { z } from "zod";

import { MAX_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH } from "@/lib/shared/password-rules";

// The same schemas validate the form in the browser and the action on the server.

export const emailSchema = z
  .string()
  .trim()
  .min(1, "Enter your e-mail address.")
  .max(254, "That e-mail address is too long.")
  .pipe(z.email("Enter a valid e-mail address, like name@example.com."))
  .transform((value) => value.toLowerCase());

const newPasswordSchema = z
  .string()
  .min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters.`)
  .max(MAX_PASSWORD_LENGTH, `Use at most ${MAX_PASSWORD_LENGTH} characters.`);

export const signUpSchema = z.object({
  name: z
    .string()
    .trim()
    .min(1, "Enter your name.")
    .max(100, "Keep the name under 100 characters."),
  email: emailSchema,
  password: newPasswordSchema,
});
export type SignUpInput = z.input<typeof signUpSchema>;

export const signInSchema = z.object({
  email: emailSchema,
  // No length rule here: old passwords must still be accepted, wrong ones fail the same way.
  password: z.string().min(1, "Enter your password.").max(MAX_PASSWORD_LENGTH),
});
export type SignInInput = z.input<typeof signInSchema>;

export const resetRequestSchema = z.object({ email: emailSchema });
export type ResetRequestInput = z.input<typeof resetRequestSchema>;

export const resetPasswordSchema = z
  .object({
    token: z.string().min(1),
    password: newPasswordSchema,
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, {
    message: "The two passwords differ.",
    path: ["confirm"],
  });
export type ResetPasswordInput = z.input<typeof resetPasswordSchema>;
