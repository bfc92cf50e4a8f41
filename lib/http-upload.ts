import "server-only";
import { AppError } from "@/lib/errors";
import { readBodyText } from "@/lib/http-body";
import type { z } from "zod";
import { speedUploadSchema, SPEED_UPLOAD_MAX_BYTES } from "@/lib/validations/speed";

// An uploaded speed-lab file arrives as JSON { fileName, content }. Too big a file is a 400 naming the limit
// (the coach chose a wrong file), not the generic 413 of an oversized request.
const BODY_LIMIT = SPEED_UPLOAD_MAX_BYTES * 2 + 4096;

export async function readSpeedUpload<S extends z.ZodType<{ fileName: string; content: string }>>(
  req: Request,
  schema?: S,
): Promise<z.infer<S>> {
  const tooBig = () =>
    new AppError("invalid", `The file is over ${SPEED_UPLOAD_MAX_BYTES / 1024 / 1024} MB. Nothing was saved.`, {
      fields: { file: [`At most ${SPEED_UPLOAD_MAX_BYTES / 1024 / 1024} MB`] },
    });
  let text: string;
  try {
    text = await readBodyText(req, BODY_LIMIT);
  } catch (e) {
    if (e instanceof AppError && e.code === "too_large") throw tooBig();
    throw e;
  }
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    throw new AppError("invalid", "The request body must be JSON", { fields: { _: ["Not valid JSON"] } });
  }
  const parsed = (schema ?? speedUploadSchema).parse(body) as z.infer<S>;
  if (Buffer.byteLength(parsed.content, "utf8") > SPEED_UPLOAD_MAX_BYTES) throw tooBig();
  return parsed;
}
