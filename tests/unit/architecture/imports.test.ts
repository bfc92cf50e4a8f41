import { readdirSync, readFileSync } from "node:fs";
import { join, relative, resolve } from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";

// The layering DEVELOPERS.md ("Layout") promises, read from the import statements themselves: repositories
// (lib/data) never reach up into services or notices, and the load engine stays pure and isomorphic.

const root = resolve(__dirname, "../../..");

function sourceFiles(dir: string): string[] {
  return readdirSync(join(root, dir), { withFileTypes: true }).flatMap((e) => {
    const path = join(dir, e.name);
    if (e.isDirectory()) return sourceFiles(path);
    return /\.tsx?$/.test(e.name) ? [path] : [];
  });
}

/** Every module a file names (static imports, re-exports, import() and import types), as an "@/…" path or a package name. */
function importsOf(file: string): string[] {
  const info = ts.preProcessFile(readFileSync(join(root, file), "utf8"), true, true);
  return info.importedFiles.map(({ fileName }) => {
    if (!fileName.startsWith(".")) return fileName;
    return `@/${relative(root, resolve(root, file, "..", fileName))
      .split("\\")
      .join("/")}`;
  });
}

function offending(dir: string, forbidden: (spec: string) => boolean): string[] {
  return sourceFiles(dir).flatMap((file) =>
    importsOf(file)
      .filter(forbidden)
      .map((spec) => `${file} imports ${spec}`),
  );
}

const under = (spec: string, folder: string) => spec === folder || spec.startsWith(`${folder}/`);

describe("import layering", () => {
  it("finds the files it checks (the scan is not empty)", () => {
    expect(sourceFiles("lib/data").length).toBeGreaterThan(10);
    expect(importsOf("lib/data/plan-rows.ts")).toContain("@/models");
  });

  it("lib/data imports nothing from lib/notices or lib/services", () => {
    expect(offending("lib/data", (s) => under(s, "@/lib/notices") || under(s, "@/lib/services"))).toEqual([]);
  });

  it("lib/load and lib/speed import nothing server-side (no database, models, mail, env, Node built-ins or React)", () => {
    const server = [
      "@/models",
      "@/lib/data",
      "@/lib/services",
      "@/lib/notices",
      "@/lib/db",
      "@/lib/mail",
      "@/lib/auth",
      "@/lib/env",
    ];
    const packages = ["server-only", "sequelize", "sqlite3", "react", "next", "nodemailer", "fs", "path", "crypto"];
    const bad = (s: string) =>
      server.some((f) => under(s, f)) || packages.some((p) => under(s, p)) || s.startsWith("node:");
    expect(offending("lib/load", bad)).toEqual([]);
    expect(offending("lib/speed", bad)).toEqual([]);
  });

  it("lib/domain (the value sets models, validations and screens share) imports nothing but itself", () => {
    expect(offending("lib/domain", (s) => !under(s, "@/lib/domain"))).toEqual([]);
  });

  it("models take their value sets from lib/domain instead of spelling them", () => {
    const spelled = sourceFiles("models").filter((f) =>
      /export const [A-Z_]+ = \[/.test(readFileSync(join(root, f), "utf8")),
    );
    expect(spelled).toEqual([]);
  });

  it("the check would catch a wrong edge", () => {
    expect(importsOf("lib/services/plan-changes.ts")).toContain("@/lib/notices/hooks");
    expect(importsOf("lib/notices/hooks.ts")).toContain("@/lib/data/alerts");
  });
});
