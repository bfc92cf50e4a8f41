import { METRICS, type Metric } from "@/lib/load/types";
import type { WeekPreviewContext } from "@/lib/load/week-preview";

/**
 * Shrinks the history the plan GET sends for the drag preview. Only the team's ACWR metric needs every day
 * (its chronic average reaches back weeks); the other metrics enter the week's numbers only through last
 * week's totals (weekly change, jump flags), so their older days are sent as 0. No number the preview
 * computes changes (tests/unit/plan/preview.test.ts compares with the server over compacted contexts).
 */
export function compactContext(ctx: WeekPreviewContext, acwrMetric: Metric, keepDays = 7): WeekPreviewContext {
  const historyValues = {} as Record<Metric, number[]>;
  for (const m of METRICS) {
    const col = ctx.historyValues[m];
    if (m === acwrMetric) {
      historyValues[m] = col;
      continue;
    }
    const from = Math.max(0, col.length - keepDays);
    historyValues[m] = col.map((v, i) => (i >= from ? v : 0));
  }
  return { ...ctx, historyValues };
}
