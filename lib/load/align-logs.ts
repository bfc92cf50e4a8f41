// Pairing each session with its log (at most one counts: the later one).
import type { LogInput, SessionInput } from "./types";

export function indexLogs(logs: readonly LogInput[]): Map<string, LogInput> {
  const map = new Map<string, LogInput>();
  for (const log of logs) map.set(log.sessionId, log); // a later log for the same session replaces an earlier one
  return map;
}

/** Each session's log, aligned by index with `sessions` (undefined = not logged). */
export type AlignedLogs = readonly (LogInput | undefined)[];

/**
 * Pairs sessions with their logs. The data layer hands logs over in session order, so one merge pass usually
 * does it: if every log is matched in order, no session was skipped that had one (ids are unique). Otherwise
 * (another order, or two logs for one session) a Map decides, where a later log replaces an earlier one.
 */
export function alignLogs(sessions: readonly SessionInput[], logs: readonly LogInput[]): AlignedLogs {
  const out: (LogInput | undefined)[] = [];
  let j = 0;
  for (let k = 0; k < sessions.length; k++) {
    const log = logs[j];
    if (log !== undefined && log.sessionId === sessions[k].id) {
      out.push(log);
      j++;
    } else out.push(undefined);
  }
  if (j === logs.length) return out;
  const byId = indexLogs(logs);
  return sessions.map((s) => byId.get(s.id));
}
