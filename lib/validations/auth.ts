import { z } from "zod";
import { emailText, lineText } from "./text";

export const signInSchema = z.object({
  email: emailText(),
  password: z.string().min(1, "Enter your password").max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

export const setPasswordSchema = z
  .object({
    token: lineText().min(20, "This link is not valid").max(200),
    password: z.string().min(10, "Use at least 10 characters").max(200),
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ" });
export type SetPasswordInput = z.infer<typeof setPasswordSchema>;

export const forgotPasswordSchema = z.object({
  email: emailText(),
});
export type ForgotPasswordInput = z.infer<typeof forgotPasswordSchema>;
