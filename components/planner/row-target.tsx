import { clsx } from "clsx";
import { memo } from "react";
import { formatNumber } from "@/lib/format/number";
import type { RowLoad } from "@/lib/plan/types";
import type { GridPhase } from "@/lib/season/season-grid";
import { checkTargets, type TargetRange } from "@/lib/season/targets";

const LABEL = { hsrM: "HSR", nearMaxM: "Near-max", contacts: "Contacts", srpe: "sRPE" } as const;
const UNIT = { hsrM: " m", nearMaxM: " m", contacts: "", srpe: "" } as const;

function rangeText({ min, max }: TargetRange): string {
  if (min !== null && max !== null) return `${formatNumber(min, 0)}–${formatNumber(max, 0)}`;
  return min !== null ? `at least ${formatNumber(min, 0)}` : `at most ${formatNumber(max ?? 0, 0)}`;
}

/**
 * The row's week against its season phase's weekly targets, from the figures shown (a previewed drop's figures
 * while one is held), so a drag shows at once whether the week lands inside its target.
 */
export const RowTarget = memo(function RowTarget({ phase, load }: { phase: GridPhase | null; load: RowLoad }) {
  if (!phase) return null;
  const checks = checkTargets(load.week.totals, phase.targets);
  if (checks.length === 0) return null;
  return (
    <div data-testid="row-target" data-phase-id={phase.id} className="mt-1 text-2xs text-ink-600">
      <span className="font-medium text-ink-700">{phase.name} target</span>
      <ul className="mt-0.5 space-y-px">
        {checks.map((c) => (
          <li
            key={c.metric}
            data-metric={c.metric}
            data-standing={c.standing}
            data-value={Math.round(c.value)}
            className={clsx(c.standing !== "within" && "font-medium text-ink-900")}
          >
            {c.standing === "below" ? "▼ " : c.standing === "above" ? "▲ " : "✓ "}
            {LABEL[c.metric]} {formatNumber(c.value, 0)}
            {UNIT[c.metric]} of {rangeText(c.range)}
            <span className="sr-only">
              : {c.standing === "within" ? "on target" : c.standing === "below" ? "under target" : "over target"}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
});
