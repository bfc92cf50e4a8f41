import { z } from "zod";
import { emailText, lineText } from "./text";
import { ROLES } from "@/lib/auth/roles";

const roleSchema = z.enum(ROLES, { message: "Choose a role" });

export const addMemberSchema = z.object({
  name: lineText().min(2, "Enter the member's name").max(120, "Keep the name under 120 characters"),
  email: emailText(),
  role: roleSchema,
  /** For an athlete: link an existing athlete profile instead of creating one. */
  athleteId: z.coerce.number().int().positive().optional(),
});
export type AddMemberInput = z.infer<typeof addMemberSchema>;
export type AddMemberFormValues = z.input<typeof addMemberSchema>;

export const changeRoleSchema = z.object({ role: roleSchema });
