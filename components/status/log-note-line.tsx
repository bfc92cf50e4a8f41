import { Badge } from "@/components/ui/badge";
import type { LogNote } from "@/lib/data/log-notes";
import { formatDayLabel } from "@/lib/dates/plain-date";
import { BODY_REGION_LABEL } from "@/lib/domain/wellbeing";

/** One athlete's log note as staff lists show it: who, which session, the pain report with it, the words. */
export function LogNoteLine({ note: n }: { note: LogNote }) {
  return (
    <>
      <span className="font-medium text-ink-900">{n.athleteName}</span>
      <span className="text-xs text-ink-600">
        {formatDayLabel(n.date)} · {n.title}
      </span>
      {n.pain ? (
        <Badge tone={n.pain.severity >= 4 ? "spike" : "climb"}>
          Pain: {BODY_REGION_LABEL[n.pain.region]} {n.pain.severity}/10
          {n.pain.stoppedSession ? ", stopped the session" : ""}
        </Badge>
      ) : null}
      {n.messages > 0 ? (
        <span className="text-xs text-ink-500">{n.messages === 1 ? "1 answer" : `${n.messages} answers`}</span>
      ) : null}
      <span className="w-full break-words text-ink-900">&ldquo;{n.note}&rdquo;</span>
    </>
  );
}

/** Where a note is read in full and answered: the athlete's status page, at that session's log. */
export const logNoteHref = (n: Pick<LogNote, "athleteId" | "sessionId">) =>
  `/status/${n.athleteId}#session-${n.sessionId}`;
