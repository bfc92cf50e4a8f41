import "server-only";
import { z } from "zod";
import { BUSY_MESSAGE, isDatabaseBusy } from "@/lib/db/busy";
import { AppError, type FieldErrors } from "@/lib/errors";
import { zodFields } from "@/lib/http";

export type ActionResult<T = undefined> = { ok: true; data: T } | { ok: false; message: string; fields?: FieldErrors };

/** Runs a server action body and turns known errors into a result the form can show field by field. */
export async function runAction<T>(fn: () => Promise<T>): Promise<ActionResult<T>> {
  try {
    return { ok: true, data: await fn() };
  } catch (err) {
    if (err instanceof AppError) {
      if (err.status >= 500) throw err;
      return { ok: false, message: err.message, fields: err.fields };
    }
    if (err instanceof z.ZodError)
      return { ok: false, message: "Check the highlighted fields", fields: zodFields(err) };
    if (isDatabaseBusy(err)) return { ok: false, message: BUSY_MESSAGE };
    // Next's redirect()/notFound() signals must pass through untouched.
    throw err;
  }
}
