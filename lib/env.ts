import { z } from "zod";

// Safe defaults so a laptop runs with no .env at all; production must set NEXTAUTH_SECRET and NEXTAUTH_URL.
const schema = z.object({
  NODE_ENV: z.enum(["development", "production", "test"]).default("development"),
  DATABASE_URL: z.string().min(1).default("file:./data/sprintwright.sqlite"),
  NEXTAUTH_URL: z.url().default("http://localhost:3000"),
  NEXTAUTH_SECRET: z.string().min(16).optional(),
  APP_URL: z.url().optional(),
  // Session lifetimes (lib/auth/session-policy.ts); fractions are allowed so tests can use seconds.
  SESSION_IDLE_MINUTES: z.coerce.number().positive().optional(),
  SESSION_MAX_HOURS: z.coerce.number().positive().optional(),
});

export type Env = z.infer<typeof schema>;

let cached: Env | undefined;

export function env(): Env {
  if (!cached) {
    const parsed = schema.safeParse(process.env);
    if (!parsed.success) {
      const fields = parsed.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ");
      throw new Error(`Invalid environment: ${fields}`);
    }
    cached = parsed.data;
  }
  return cached;
}

/** The secret that signs session JWTs. A fixed development value keeps sessions across restarts on a laptop. */
export function authSecret(): string {
  const e = env();
  if (e.NEXTAUTH_SECRET) return e.NEXTAUTH_SECRET;
  if (e.NODE_ENV === "production" && process.env.NEXT_PHASE !== "phase-production-build") {
    throw new Error("NEXTAUTH_SECRET must be set in production (e.g. `openssl rand -base64 32`).");
  }
  return "sprintwright-development-secret-change-me";
}

export function appUrl(): string {
  const e = env();
  return (e.APP_URL ?? e.NEXTAUTH_URL).replace(/\/$/, "");
}

/** "postgres" for a postgres:// (or postgresql://) DATABASE_URL, SQLite for anything else. */
export function databaseDialect(url = env().DATABASE_URL): "sqlite" | "postgres" {
  return /^postgres(ql)?:\/\//i.test(url) ? "postgres" : "sqlite";
}

/** Resolves DATABASE_URL (`file:./x.sqlite`, `sqlite:x.sqlite`, a bare path or `:memory:`) to a storage path. */
export function databaseStorage(url = env().DATABASE_URL): string {
  return url.replace(/^(file|sqlite):(\/\/)?/, "");
}
