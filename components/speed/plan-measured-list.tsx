import Link from "next/link";
import { Card } from "@/components/ui/card";
import type { PlanMeasured } from "@/lib/speed/plan-measured";
import { PlanMeasuredTable } from "./plan-measured-table";

/** An athlete's sessions measured by a speed trace, newest first, each planned against measured. */
export function PlanMeasuredList({ items }: { items: readonly PlanMeasured[] }) {
  return (
    <section aria-labelledby="plan-measured" className="mt-8 space-y-3" data-testid="plan-measured-list">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <h2 id="plan-measured" className="font-semibold text-ink-950">
          Sessions measured by a speed trace
        </h2>
        <Link href={`/speed/${items[0].athleteId}`} className="text-sm font-medium text-lane-700 underline">
          Speed profile
        </Link>
      </div>
      {[...items].reverse().map((m) => (
        <Card key={m.testId} className="p-4">
          <PlanMeasuredTable m={m} />
        </Card>
      ))}
      <p className="text-xs text-ink-500">
        The load figures above count the plan and the athlete&apos;s log; a trace&apos;s metres are shown beside the
        plan only.
      </p>
    </section>
  );
}
