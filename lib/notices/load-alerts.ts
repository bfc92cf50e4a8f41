import "server-only";
import type { Transaction } from "sequelize";
import { loadAlertEmail } from "@/emails/load-alert";
import { syncWeekAlerts, type AlertCandidate } from "@/lib/data/alerts";
import { getTeamClock, type LoadAthleteInputs, type LoadInputs } from "@/lib/data/load";
import { getLedgerWeeks } from "@/lib/data/load-ledger";
import { teamToday } from "@/lib/dates/zoned";
import { enqueueMail } from "@/lib/data/outbox";
import { getNoticeTeam, listAlertRecipients } from "@/lib/data/notification-settings";
import { appUrl } from "@/lib/env";
import { addDays, startOfWeek } from "@/lib/dates/plain-date";
import { computeAthleteLoad, type AthleteLoad, type Flag } from "@/lib/load";
import type { AlertBasis, AlertKind } from "@/lib/domain/alerts";
import { toLoadAlertItem } from "./alert-display";

/** Engine flags that become alerts ("rising" and "low" stay on the load screens). */
const WEEK_KINDS: readonly AlertKind[] = ["spike", "weekly_jump", "plyo_volume", "recovery"];
/**
 * A change also moves the next week's comparison with this one and the recovery gap across the weekend.
 * Spikes are judged in the changed week only: the next week's ratio is still high from the same sessions.
 */
const NEXT_WEEK_KINDS: readonly AlertKind[] = ["weekly_jump", "recovery"];

type FlagKindForAlert = "spike" | "weekly_jump" | "plyo_volume" | "recovery";

/** How far a flag goes past its threshold; recovery is a floor (fewer hours is worse). */
function severity(flag: Flag): number {
  if (flag.threshold === 0) return flag.value;
  return flag.kind === "recovery" ? flag.threshold / Math.max(flag.value, 1e-9) : flag.value / flag.threshold;
}

/** The strongest flag of each alert kind (one alert per athlete × kind × week). */
export function strongestByKind(flags: readonly Flag[], kinds: readonly AlertKind[]): AlertCandidate[] {
  const best = new Map<AlertKind, Flag>();
  for (const flag of flags) {
    const kind = flag.kind as FlagKindForAlert;
    if (!kinds.includes(kind)) continue;
    const current = best.get(kind);
    if (!current || severity(flag) > severity(current)) best.set(kind, flag);
  }
  return [...best.entries()].map(([kind, f]) => ({
    kind,
    level: f.level,
    metric: f.metric ?? null,
    value: f.value,
    threshold: f.threshold,
    date: f.date,
    reason: f.reason,
    provisional: Boolean(f.provisional),
  }));
}

/**
 * The week an alert is judged on: the athlete's one daily series (whole history from getAthleteLoadInputs) on
 * the projected view, so the figures in alerts and their e-mails are the figures every screen shows.
 */
export function alertWeekLoad({
  inputs,
  weekStart,
  today,
}: {
  inputs: LoadInputs & { athlete: LoadAthleteInputs };
  weekStart: string;
  today: string;
}): AthleteLoad {
  return computeAthleteLoad({
    profile: inputs.athlete.profile,
    settings: inputs.settings,
    sessions: inputs.athlete.sessions,
    logs: inputs.athlete.logs,
    from: weekStart,
    to: addDays(weekStart, 6),
    today,
    view: "projected",
    weekStart,
    weekStartDay: inputs.weekStartDay,
  });
}

export type EvaluateArgs = {
  transaction: Transaction;
  teamId: number;
  /** Per athlete, the session dates the change touched (before and after), YYYY-MM-DD. */
  athletes: ReadonlyArray<{ athleteId: number; dates: readonly string[] }>;
  basis: AlertBasis;
  /** The team's "today"; defaults to the clock in the team's zone. */
  today?: string;
};

/**
 * Runs the load engine over the weeks a change touched (on the projected view: logged work plus the plan
 * from today on, so a spike is flagged while it is still only planned), records new alerts and queues
 * their e-mails, all inside the caller's transaction. Returns the ids of the new alerts. Each week is read
 * once for every athlete it concerns, so a squad-wide write (a generated progression) costs a read per week.
 */
export async function evaluateLoadAlerts(args: EvaluateArgs): Promise<number[]> {
  const { transaction, teamId } = args;
  if (args.athletes.every((a) => a.dates.length === 0)) return [];
  // The writer has brought the ledger up to date in this transaction (README §12); getLedgerWeek would take in
  // anything still marked.
  const clock = await getTeamClock({ teamId, transaction });
  const weekStartDay = clock.weekStartDay;
  // week → athlete → the alert kinds judged there.
  const weeks = new Map<string, Map<number, Set<AlertKind>>>();
  const judge = (weekStart: string, athleteId: number, kinds: readonly AlertKind[]) => {
    const byAthlete = weeks.get(weekStart) ?? new Map<number, Set<AlertKind>>();
    byAthlete.set(athleteId, new Set([...(byAthlete.get(athleteId) ?? []), ...kinds]));
    weeks.set(weekStart, byAthlete);
  };
  for (const { athleteId, dates } of args.athletes)
    for (const w of new Set(dates.map((d) => startOfWeek(d, weekStartDay)))) {
      judge(w, athleteId, WEEK_KINDS);
      judge(addDays(w, 7), athleteId, NEXT_WEEK_KINDS);
    }
  const today = args.today ?? teamToday({ timeZone: clock.timeZone, now: new Date() });
  const names = new Map<number, string>();

  const athleteIds = [...new Set([...weeks.values()].flatMap((byAthlete) => [...byAthlete.keys()]))];
  const read = await getLedgerWeeks({
    teamId,
    athleteIds,
    starts: [...weeks.keys()],
    today,
    view: "projected",
    transaction,
  });
  for (const a of read.athletes) names.set(a.id, a.name);
  const created: Array<{ id: number; athleteId: number } & AlertCandidate> = [];
  for (const [weekStart, byAthlete] of [...weeks.entries()].sort(([a], [b]) => a.localeCompare(b))) {
    const checks = read.athletes.flatMap((athlete) => {
      const kindSet = byAthlete.get(athlete.id);
      if (!kindSet) return [];
      const kinds = WEEK_KINDS.filter((k) => kindSet.has(k));
      const flags = athlete.weeks.get(weekStart)!.flags;
      return [{ athleteId: athlete.id, kinds, candidates: strongestByKind(flags, kinds) }];
    });
    created.push(...(await syncWeekAlerts({ transaction, teamId, weekStart, basis: args.basis, athletes: checks })));
  }
  if (created.length === 0) return [];

  const recipients = (await listAlertRecipients({ teamId, transaction })).filter((r) => r.alertEmail === "each");
  const team = await getNoticeTeam({ teamId, transaction });
  const base = appUrl();
  for (const alert of created) {
    const item = toLoadAlertItem({ ...alert, athleteName: names.get(alert.athleteId) ?? "", basis: args.basis }, base);
    for (const r of recipients) {
      await enqueueMail({
        transaction,
        teamId,
        kind: "alert",
        to: r.email,
        mail: loadAlertEmail({ ...item, recipientName: r.name, teamName: team?.name ?? "your team" }),
        dedupeKey: `alert:${alert.id}:user:${r.userId}`,
      });
    }
  }
  return created.map((a) => a.id);
}
