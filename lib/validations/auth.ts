import { z } from "zod";
import { passwordFor, passwordSchema } from "./password";
import { emailText, lineText } from "./text";

export const signInSchema = z.object({
  email: emailText(),
  password: z.string().min(1, "Enter your password").max(200),
});
export type SignInInput = z.infer<typeof signInSchema>;

const setPasswordFields = {
  token: lineText().min(20, "This link is not valid").max(200),
  confirm: z.string().max(200),
};
const sameTwice = (v: { password: string; confirm: string }) => v.password === v.confirm;
const differ = { path: ["confirm"], message: "The two passwords differ" };

/** A new password from a one-time link. The server checks it against the account's e-mail too (lib/data/users.ts). */
export const setPasswordSchema = z.object({ ...setPasswordFields, password: passwordSchema }).refine(sameTwice, differ);
export type SetPasswordInput = z.infer<typeof setPasswordSchema>;

/** The same with the e-mail check, for a form that knows whose password it sets. */
export function setPasswordSchemaFor(email: string) {
  return z.object({ ...setPasswordFields, password: passwordFor(email) }).refine(sameTwice, differ);
}

export const forgotPasswordSchema = z.object({
  email: emailText(),
});
export type ForgotPasswordInput = z.infer<typeof forgotPasswordSchema>;
