// Finds every route handler (and its exported methods), server action and page from the file tree, so the
// authorization matrix and the fuzz test cover whatever exists, not a list someone remembered to update.
import { readdirSync, readFileSync } from "node:fs";
import { join, relative, sep } from "node:path";

const APP = join(process.cwd(), "app");
const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;

function walk(dir: string, name: string): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = join(dir, entry.name);
    if (entry.isDirectory()) out.push(...walk(full, name));
    else if (entry.name === name) out.push(full);
  }
  return out;
}

/** `app/(workspace)/squad/[athleteId]/page.tsx` → `/squad/[athleteId]`: route groups vanish from URLs. */
function urlOf(file: string): string {
  const parts = relative(APP, file)
    .split(sep)
    .slice(0, -1)
    .filter((p) => !/^\(.*\)$/.test(p));
  return `/${parts.join("/")}`;
}

function exportedNames(source: string): string[] {
  const names = new Set<string>();
  for (const m of source.matchAll(/export\s+(?:async\s+)?(?:const|function|let)\s+([A-Za-z_$][\w$]*)/g))
    names.add(m[1]);
  for (const m of source.matchAll(/export\s*\{([^}]*)\}/g)) {
    for (const part of m[1].split(",")) {
      const alias = part
        .trim()
        .split(/\s+as\s+/)
        .pop()
        ?.trim();
      if (alias) names.add(alias);
    }
  }
  return [...names];
}

export type RouteHandler = { key: string; method: string; path: string; file: string };

/** One entry per exported HTTP method of every app/api/**\/route.ts. */
export function discoverRoutes(): RouteHandler[] {
  return walk(join(APP, "api"), "route.ts")
    .flatMap((file) => {
      const path = urlOf(file);
      return exportedNames(readFileSync(file, "utf8"))
        .filter((n) => (HTTP_METHODS as readonly string[]).includes(n))
        .map((method) => ({ key: `${method} ${path}`, method, path, file: relative(process.cwd(), file) }));
    })
    .sort((a, b) => a.key.localeCompare(b.key));
}

export type PageEntry = { key: string; path: string; file: string };

export function discoverPages(): PageEntry[] {
  return walk(APP, "page.tsx")
    .map((file) => ({ key: `PAGE ${urlOf(file)}`, path: urlOf(file), file: relative(process.cwd(), file) }))
    .sort((a, b) => a.key.localeCompare(b.key));
}

export type ActionEntry = { key: string; name: string; file: string };

/** Every exported function of every app/**\/actions.ts ("use server" files export only actions). */
export function discoverActions(): ActionEntry[] {
  return walk(APP, "actions.ts")
    .flatMap((file) => {
      const rel = relative(process.cwd(), file);
      return exportedNames(readFileSync(file, "utf8")).map((name) => ({
        key: `ACTION ${urlOf(file)}#${name}`,
        name,
        file: rel,
      }));
    })
    .sort((a, b) => a.key.localeCompare(b.key));
}
