import Link from "next/link";
import { Badge } from "@/components/ui/badge";
import { Card, EmptyState } from "@/components/ui/card";
import type { MailSummary } from "@/lib/mail/mailbox";

function received(iso: string): string {
  return new Date(iso).toLocaleString("en-GB", {
    day: "numeric",
    month: "short",
    hour: "2-digit",
    minute: "2-digit",
    second: "2-digit",
  });
}

/** The signed-in member's own mail in the local mailbox, newest first. */
export function MailList({ mails }: { mails: MailSummary[] }) {
  if (mails.length === 0)
    return (
      <EmptyState title="No mail for you yet">
        Mail the app sends to you (alerts, invitations, calendar invites, password resets) lands here.
      </EmptyState>
    );
  return (
    <Card className="divide-y divide-ink-100" data-testid="mail-list">
      {mails.map((m) => (
        <Link key={m.id} href={`/mailbox/${m.id}`} className="block px-4 py-3 hover:bg-ink-50" data-testid="mail-row">
          <div className="flex items-baseline justify-between gap-3">
            <p className="min-w-0 truncate font-medium text-ink-900" data-testid="mail-subject">
              {m.subject || "(no subject)"}
            </p>
            <time className="shrink-0 text-xs text-ink-500 tabular-nums" dateTime={m.receivedAt}>
              {received(m.receivedAt)}
            </time>
          </div>
          <div className="mt-0.5 flex flex-wrap items-center gap-2 text-xs text-ink-500">
            <span className="min-w-0 truncate">To {m.to.join(", ") || "(nobody)"}</span>
            {m.hasCalendar ? <Badge tone="lane">calendar</Badge> : null}
            {m.attachmentCount > 0 && !m.hasCalendar ? <Badge>{m.attachmentCount} attachment(s)</Badge> : null}
          </div>
        </Link>
      ))}
    </Card>
  );
}
