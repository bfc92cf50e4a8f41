import { createHash, randomBytes } from "node:crypto";

/** A long random URL-safe token; only its SHA-256 is stored, so a database leak does not leak links. */
export function newToken(bytes = 32): { token: string; hash: string } {
  const token = randomBytes(bytes).toString("base64url");
  return { token, hash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}
