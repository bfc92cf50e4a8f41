import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from "node:crypto";
import { authSecret } from "@/lib/env";

// AES-256-GCM with a key derived (HKDF-SHA256, RFC 5869) from the app secret: the database alone does not
// reveal a feed link, yet its owner can see the link again. Lookups use the SHA-256 hash, never this.
function key(secret: string): Buffer {
  return Buffer.from(hkdfSync("sha256", secret, "sprintwright", "calendar-feed-token", 32));
}

export function sealToken(token: string, secret = authSecret()): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv("aes-256-gcm", key(secret), iv);
  const body = Buffer.concat([cipher.update(token, "utf8"), cipher.final()]);
  return ["v1", iv.toString("base64url"), body.toString("base64url"), cipher.getAuthTag().toString("base64url")].join(
    ".",
  );
}

/** The token, or null when it was sealed with another secret or the text was tampered with. */
export function unsealToken(sealed: string, secret = authSecret()): string | null {
  const [version, iv, body, tag] = sealed.split(".");
  if (version !== "v1" || !iv || !body || !tag) return null;
  try {
    const decipher = createDecipheriv("aes-256-gcm", key(secret), Buffer.from(iv, "base64url"));
    decipher.setAuthTag(Buffer.from(tag, "base64url"));
    return Buffer.concat([decipher.update(Buffer.from(body, "base64url")), decipher.final()]).toString("utf8");
  } catch {
    return null;
  }
}
