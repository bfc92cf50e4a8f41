import { z } from "zod";
import { noteText } from "./text";

/** POST /api/sessions/[sessionId]/messages: one message in the session's thread. */
export const sessionMessageSchema = z
  .object({
    body: noteText({ error: "Write a message" })
      .min(1, "Write a message")
      .max(1000, "Keep the message under 1000 characters"),
  })
  .strict();
export type SessionMessageInput = z.infer<typeof sessionMessageSchema>;
