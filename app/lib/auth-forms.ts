// Form schemas shared by the browser (Conform's client validation) and the server actions.
import { z } from "zod";
import { nameField } from "./name-field";

const email = z
  .email("Enter a valid e-mail address.")
  .max(254)
  .transform((v) => v.toLowerCase());
const newPassword = z.string({ error: "Choose a password." }).min(10, "Use at least 10 characters.").max(128, "Use at most 128 characters.");

export const signInSchema = z.object({
  email: z.string({ error: "Enter your e-mail address." }).trim().pipe(email),
  password: z.string({ error: "Enter your password." }).max(128),
  redirectTo: z.string().optional(),
});

export const signUpSchema = z.object({
  name: z.string({ error: "Enter your name." }).trim().min(2, "Enter your full name.").max(100),
  email: z.string({ error: "Enter your e-mail address." }).trim().pipe(email),
  password: newPassword,
  redirectTo: z.string().optional(),
});

export const forgotPasswordSchema = z.object({
  email: z.string({ error: "Enter your e-mail address." }).trim().pipe(email),
});

export const resetPasswordSchema = z
  .object({
    token: z.string({ error: "The reset link is incomplete." }).min(1),
    password: newPassword,
    confirm: z.string({ error: "Type the password again." }),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ." });

export const teamNameSchema = z.object({
  // Zero-width and other invisible characters alone would show as a blank name in e-mails and pages.
  name: nameField("Name your team.", { max: 80, tooLong: "Use at most 80 characters." }),
});

export const inviteSchema = z.object({
  intent: z.literal("invite"),
  email: z.string({ error: "Enter your colleague's e-mail address." }).trim().pipe(email),
});

/** Only same-site paths are followed after sign-in (no open redirects). */
export function safeRedirect(to: unknown, fallback = "/") {
  if (typeof to !== "string" || !to.startsWith("/") || to.startsWith("//") || to.startsWith("/\\")) return fallback;
  return to;
}
