import "server-only";
import { AppError } from "@/lib/errors";

/** The largest JSON body a route handler reads: the biggest real one (a full week preview) is under 100 kB. */
export const JSON_BODY_LIMIT = 1024 * 1024;

function tooLarge(limit: number): AppError {
  return new AppError("too_large", `The request body is over ${Math.round(limit / 1024)} kB`, {
    fields: { _: [`At most ${Math.round(limit / 1024)} kB`] },
  });
}

/**
 * The body as UTF-8 text, read chunk by chunk and abandoned as soon as it passes `limit` bytes (413), so a
 * huge or endless body never sits in memory. A declared Content-Length over the limit is refused before reading.
 */
export async function readBodyText(req: Request, limit: number): Promise<string> {
  const declared = Number(req.headers.get("content-length") ?? "");
  if (Number.isFinite(declared) && declared > limit) throw tooLarge(limit);
  if (!req.body) return "";
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel().catch(() => {});
      throw tooLarge(limit);
    }
    chunks.push(value);
  }
  try {
    return new TextDecoder("utf-8", { fatal: true }).decode(Buffer.concat(chunks));
  } catch {
    throw new AppError("invalid", "The request body must be UTF-8 text", { fields: { _: ["Not valid UTF-8"] } });
  }
}
