import { alertFacts } from "@/emails/load-alert-parts";
import { toLoadAlertItem, type AlertForMail } from "@/lib/notices/alert-display";

/** The same facts the alert e-mail lists (flag, metric, value, threshold, day, basis), as a definition list. */
export function AlertFacts({ alert }: { alert: AlertForMail }) {
  const rows = alertFacts(toLoadAlertItem(alert, "")).filter(([label]) => label !== "Flag");
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="text-ink-500">{label}</dt>
          <dd className="font-medium text-ink-900 tabular-nums">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
