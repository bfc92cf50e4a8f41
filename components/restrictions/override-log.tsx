import { formatDayShort } from "@/lib/format/dates";
import type { OverrideRow } from "@/lib/data/restrictions";

/** Every time a coach planned past a restriction, with their reason: the medical staff read this. */
export function OverrideLog({ overrides }: { overrides: readonly OverrideRow[] }) {
  return (
    <section className="mt-5 border-t border-ink-100 pt-4" data-testid="override-log">
      <h3 className="text-sm font-semibold text-ink-900">Planned past a restriction</h3>
      {overrides.length === 0 ? (
        <p className="mt-1 text-sm text-ink-500">No coach has planned past a restriction.</p>
      ) : (
        <ul className="mt-2 divide-y divide-ink-100">
          {overrides.map((o) => (
            <li key={o.id} className="py-2 text-sm" data-testid="override-item">
              <p className="font-medium text-ink-900">
                {formatDayShort(o.sessionDate)} · {o.detail}
              </p>
              <p className="text-ink-700">&ldquo;{o.reason}&rdquo;</p>
              <p className="text-xs text-ink-500">
                {o.who} · against &ldquo;{o.restriction}&rdquo;
              </p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
