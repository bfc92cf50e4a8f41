import { readFileSync } from "node:fs";
import { createRequire } from "node:module";
import type { RunOptions } from "axe-core";
import type { Page } from "playwright-core";

// axe-core is the general-purpose accessibility rule engine (WCAG 2.x A/AA rules); one copy of its source is
// evaluated into each page through the DevTools protocol, which the app's script CSP does not govern.
const AXE_SOURCE = readFileSync(createRequire(import.meta.url).resolve("axe-core/axe.min.js"), "utf8");

export type AxeFinding = { id: string; impact: string; help: string; nodes: string[] };

/**
 * Runs axe on the page as it stands and returns the serious and critical violations, one line per rule.
 * `rules`: rules to run on top of the WCAG tags, e.g. the experimental "label-content-name-mismatch" (2.5.3).
 */
export async function seriousAxeViolations(
  page: Page,
  options: { exclude?: string[]; rules?: string[] } = {},
): Promise<AxeFinding[]> {
  await page.evaluate(AXE_SOURCE);
  const found = await page.evaluate(
    async ([exclude, extra]: [string[], string[]]) => {
      const { axe } = window;
      const context = exclude.length ? { exclude: exclude.map((s) => [s]) } : document;
      const tags = ["wcag2a", "wcag2aa", "wcag21aa"];
      // runOnly by tag skips rules outside the tags; extra rules are run as well by naming them with the tags' rules.
      const opts: RunOptions = extra.length
        ? {
            runOnly: { type: "rule", values: [...axe.getRules(tags).map((r) => r.ruleId), ...extra] },
            rules: Object.fromEntries(extra.map((id) => [id, { enabled: true }])),
          }
        : { runOnly: { type: "tag", values: tags } };
      const run = await axe.run(context, opts);
      return run.violations.map((v) => ({
        id: v.id,
        impact: v.impact ?? "minor",
        help: v.help,
        nodes: v.nodes.slice(0, 5).map((n) => n.target.join(" ")),
      }));
    },
    [options.exclude ?? [], options.rules ?? []] as [string[], string[]],
  );
  return found.filter((f) => f.impact === "serious" || f.impact === "critical");
}
