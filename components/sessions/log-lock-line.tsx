"use client";

import useSWR from "swr";
import { ReopenLogButton } from "@/components/squad/reopen-log-button";
import { fetchJson } from "@/lib/client/fetcher";
import { planKeys } from "@/lib/client/keys";
import { formatInstantShort } from "@/lib/format/dates";

type LogAnswer = { log: unknown; lock: { locked: boolean; locksAt: string } };

/**
 * Whether the athlete may still write this session's log (it closes 48 hours after the session), and for a log
 * that closed, the coach's way to reopen it where the coach reads it (the planner's session dialog, the status page).
 */
export function LogLockLine({ sessionId, title }: { sessionId: number; title: string }) {
  const { data, mutate } = useSWR<LogAnswer>(planKeys.sessionLog(sessionId), fetchJson);
  if (!data || (!data.lock.locked && !data.log)) return null;
  return (
    <div className="flex flex-wrap items-center justify-between gap-2" data-testid="log-lock">
      <p className="text-xs text-ink-500" data-testid="log-lock-state" data-locked={data.lock.locked ? "yes" : "no"}>
        {data.lock.locked
          ? `The log closed to the athlete on ${formatInstantShort(data.lock.locksAt)}.`
          : `Open to the athlete until ${formatInstantShort(data.lock.locksAt)}.`}
      </p>
      {data.lock.locked ? <ReopenLogButton sessionId={sessionId} title={title} onReopened={() => mutate()} /> : null}
    </div>
  );
}
