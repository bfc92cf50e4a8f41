import type { PlanMeasured } from "@/lib/speed/plan-measured";

const metres = (v: number) => (Number.isFinite(v) ? `${v.toFixed(0)} m` : "–");

/** A session's planned running load next to what its speed trace measured (lib/speed/README.md §8). */
export function PlanMeasuredTable({ m, caption }: { m: PlanMeasured; caption?: string }) {
  const rows = [
    ["HSR metres", m.planned.hsrM, m.measured.hsrM],
    ["Near-max metres", m.planned.nearMaxM, m.measured.nearMaxM],
    ["Running metres", m.planned.runM, m.measured.runM],
  ] as const;
  return (
    <div className="relative mt-2 overflow-x-auto">
      <table className="w-full text-sm tabular-nums" data-testid={`plan-measured-${m.testId}`}>
        <caption className="text-left text-xs text-ink-600">
          {caption ?? `${m.title} on ${m.date}: planned against measured`}
        </caption>
        <thead>
          <tr className="text-left text-xs text-ink-500">
            <th scope="col" className="py-1 pr-3 font-medium">
              Figure
            </th>
            <th scope="col" className="py-1 pr-3 font-medium">
              Planned
            </th>
            <th scope="col" className="py-1 font-medium">
              Measured
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map(([label, planned, got]) => (
            <tr key={label} className="border-t border-ink-100">
              <th scope="row" className="py-1 pr-3 text-left font-normal text-ink-700">
                {label}
              </th>
              <td className="py-1 pr-3">{metres(planned)}</td>
              <td className="py-1 font-medium text-ink-900">{metres(got)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
