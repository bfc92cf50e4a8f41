import { Badge } from "@/components/ui/badge";
import { Card } from "@/components/ui/card";
import type { OutboxRow } from "@/lib/data/outbox";

const TONE = { pending: "climb", sending: "lane", sent: "steady", failed: "spike" } as const;

/** What the outbox still holds: mail that waits for the SMTP server, and mail that failed for good. */
export function DeliveryQueue({ rows }: { rows: OutboxRow[] }) {
  const waiting = rows.filter((r) => r.status !== "sent");
  return (
    <Card className="p-4" data-testid="delivery-queue">
      <h2 className="font-semibold text-ink-950">Outbox</h2>
      <p className="mt-1 text-xs text-ink-500">
        Every mail is queued with the change that caused it and retried with growing pauses until the mail server takes it.
      </p>
      {waiting.length === 0 ? (
        <p className="mt-3 text-sm text-ink-600">Nothing waiting: all mail was delivered.</p>
      ) : (
        <ul className="mt-3 space-y-2 text-sm">
          {waiting.map((r) => (
            <li key={r.id} className="rounded-lg bg-paper-sunk px-3 py-2">
              <div className="flex items-center justify-between gap-2">
                <span className="truncate font-medium text-ink-800">{r.subject}</span>
                <Badge tone={TONE[r.status]}>{r.status}</Badge>
              </div>
              <p className="text-xs text-ink-500">
                To {r.toEmail} · {r.attempts} attempt(s){r.status === "pending" ? ` · next ${new Date(r.nextAttemptAt).toLocaleTimeString("en-GB")}` : ""}
              </p>
              {r.lastError ? <p className="mt-1 break-words font-mono text-2xs text-flag-spike">{r.lastError}</p> : null}
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
