import { Badge } from "@/components/ui/badge";
import { BODY_REGION_LABEL } from "@/lib/domain/wellbeing";
import { formatMinutes } from "@/lib/format/duration";
import type { MySession } from "./my-session";

const DONE = { yes: "Done", partly: "Partly done", no: "Not done" } as const;

export function LogBadge({ session }: { session: MySession }) {
  if (session.status === "cancelled") return <Badge tone="spike">Cancelled</Badge>;
  if (session.log) return <Badge tone="steady">{DONE[session.log.completion]}</Badge>;
  return session.logState === "open" ? <Badge tone="note">To log</Badge> : null;
}

/** What the athlete logged, in one line. */
export function LogSummary({ session }: { session: MySession }) {
  const log = session.log;
  if (!log) return null;
  const parts = [DONE[log.completion].toLowerCase()];
  if (log.rpe !== null) parts.push(`RPE ${log.rpe}`);
  if (log.minutes !== null) parts.push(formatMinutes(log.minutes));
  if (session.pain)
    parts.push(`${BODY_REGION_LABEL[session.pain.region].toLowerCase()} pain ${session.pain.severity}/10`);
  return (
    <p className="text-sm text-ink-700" data-testid="my-log-summary">
      You logged: {parts.join(", ")}.
    </p>
  );
}
