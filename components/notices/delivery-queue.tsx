import { Badge } from "@/components/ui/badge";
import { Card } from "@/components/ui/card";
import type { DeliveryRow } from "@/lib/data/outbox";

const TONE = { pending: "climb", sending: "lane", sent: "steady", failed: "spike" } as const;

const KIND_LABEL: Record<DeliveryRow["kind"], string> = {
  alert: "Load flag",
  digest: "Daily digest",
  invitation: "Invitation",
  password_reset: "Password reset",
  calendar_request: "Calendar invite",
  calendar_cancel: "Calendar cancellation",
  session_message: "Session message",
};

/**
 * The team's outbox for the head coach: who each mail is for, what kind it is and how far it got. Never a
 * subject, body or link: those belong to the person the mail is for.
 */
export function DeliveryQueue({ rows }: { rows: DeliveryRow[] }) {
  return (
    <Card className="p-4" data-testid="delivery-queue">
      <h2 className="font-semibold text-ink-950">Team outbox</h2>
      <p className="mt-1 text-xs text-ink-500">
        Every mail is queued with the change that caused it and retried with growing pauses until the mail server takes
        it. Only its recipient can read it.
      </p>
      {rows.length === 0 ? (
        <p className="mt-3 text-sm text-ink-600">No mail queued yet.</p>
      ) : (
        <ul className="mt-3 space-y-2 text-sm">
          {rows.map((r) => (
            <li key={r.id} className="rounded-lg bg-paper-sunk px-3 py-2" data-testid="delivery-row">
              <div className="flex items-center justify-between gap-2">
                <span className="truncate font-medium text-ink-800">{KIND_LABEL[r.kind]}</span>
                <Badge tone={TONE[r.status]}>{r.status}</Badge>
              </div>
              <p className="text-xs text-ink-500">
                To {r.toEmail} · {r.attempts} attempt(s)
                {r.status === "pending" ? ` · next ${new Date(r.nextAttemptAt).toLocaleTimeString("en-GB")}` : ""}
              </p>
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
