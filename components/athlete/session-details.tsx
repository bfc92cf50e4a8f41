import { blockDescription } from "@/lib/format/block-summary";
import { formatMinutes } from "@/lib/format/duration";
import { MEDICAL_CHANGE_NOTICE } from "@/lib/restrictions/conflicts";
import type { MySession } from "./my-session";

/** A session in plain words: start time, blocks, the coach's notes and any limit from the medical staff. */
export function SessionDetails({ session }: { session: MySession }) {
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-700" data-testid="session-start">
        Starts {session.startTime} · about {formatMinutes(session.durationMin)} · planned effort RPE{" "}
        {session.plannedRpe}
      </p>
      {session.medicalChanges.length > 0 ? (
        <div
          role="note"
          className="rounded-lg bg-form-error-soft px-3 py-2 text-sm text-form-error"
          data-testid="session-medical-change"
        >
          <p className="font-medium">{MEDICAL_CHANGE_NOTICE}.</p>
          <p className="mt-0.5">
            Your medical staff set a limit after this session was planned, and the session goes past it:{" "}
            {session.medicalChanges.join("; ")}.
          </p>
        </div>
      ) : null}
      <ol className="space-y-2 text-sm text-ink-700" data-testid="session-blocks">
        {session.blocks.map((b, i) => (
          <li key={b.id ?? i} className="space-y-0.5">
            {blockDescription(b).map((line, j) => (
              <p key={j} className={j === 0 ? "font-medium text-ink-800" : "pl-3"}>
                {line}
              </p>
            ))}
          </li>
        ))}
      </ol>
      {session.notes?.trim() ? (
        <p className="rounded-lg bg-paper-sunk px-3 py-2 text-sm text-ink-700" data-testid="session-coach-notes">
          Coach&apos;s notes: {session.notes}
        </p>
      ) : null}
      {session.restrictions.length > 0 ? (
        <div className="rounded-lg bg-paper-sunk px-3 py-2 text-sm text-ink-700" data-testid="session-restrictions">
          <p className="font-medium text-ink-800">Limits from your medical staff that day</p>
          <ul className="mt-1 list-disc pl-5">
            {session.restrictions.map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
          {session.breaches.length > 0 ? (
            <p className="mt-1" data-testid="session-breach">
              Past the limit in this session: {session.breaches.join("; ")}.
            </p>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
