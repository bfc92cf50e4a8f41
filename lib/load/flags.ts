import { dateFromDayIndex, dayIndex, formatDayLabel, minutesOfDay } from "@/lib/dates/plain-date";
import { formatNumber, formatRatio } from "./format";
import { DEFAULT_SD_TYPE, monotonyOfWindow } from "./monotony";
import { aboveContactBand, contactBand } from "./plyo";
import {
  DEFAULT_JUMP_METRICS,
  METRIC_INFO,
  type AcwrMethod,
  type Metric,
  type PlyoLevel,
  type TeamLoadSettings,
} from "./types";
import { peakRatioIn, sumWindow } from "./week-summary";
import { atOrAbove, exceedsWeeklyLimit, weeklyChangePct } from "./weekly-change";

export type FlagKind = "spike" | "rising" | "low" | "weekly_jump" | "monotony" | "plyo_volume" | "recovery";
export type FlagLevel = "alert" | "caution" | "info";

/** A monitoring aid, not a diagnosis (see LOAD_CAUTION). */
export interface Flag {
  kind: FlagKind;
  level: FlagLevel;
  date: string;
  metric?: Metric;
  value: number;
  threshold: number;
  /** A sentence a coach can read. */
  reason: string;
  sessionId?: string;
  provisional?: boolean;
}

/** What the flags need to know about a session that counts in the view. */
export interface FlagSession {
  id: string;
  date: string;
  startTime: string;
  contactsByIntensity: { total: number; weighted?: number };
  highIntensity: boolean;
}

export interface FlagInput {
  /** Date of index 0 of the arrays. */
  firstDate: string;
  values: Record<Metric, ArrayLike<number>>;
  /** ACWR of settings.acwrMetric; NaN or null = no ratio. */
  ratio: ArrayLike<number | null>;
  provisional: ArrayLike<number | boolean>;
  /** 1 where a published past session has no log (its plan stands in as an estimate, or the day is left out). */
  missing?: ArrayLike<number>;
  /** Sessions that count in the view: the week's, plus those up to recoveryHours before it. */
  sessions: readonly FlagSession[];
  profile: { plyoLevel: PlyoLevel };
  settings: TeamLoadSettings;
  weekStart: string;
  /** Defaults to weekStart + 6. */
  weekEnd?: string;
}

const METHOD_WORDS: Record<AcwrMethod, string> = {
  ewma: "EWMA",
  rolling_coupled: "rolling, coupled",
  rolling_uncoupled: "rolling, uncoupled",
};

const PROVISIONAL_NOTE = " Provisional: fewer than 28 days on record stand behind this ratio.";

const KIND_ORDER: Record<FlagKind, number> = {
  spike: 0,
  rising: 1,
  low: 2,
  weekly_jump: 3,
  monotony: 4,
  plyo_volume: 5,
  recovery: 6,
};

type Peak = { index: number; value: number };

/**
 * The zone flag one peak earns; early (provisional) peaks earn at most a caution. "Underloaded" only where
 * `mayBeLow`: a whole week of settled days and no missing log in it.
 */
function zoneFlag(input: FlagInput, peak: Peak, first: number, early: boolean, mayBeLow: boolean): Flag | null {
  const { settings } = input;
  const date = dateFromDayIndex(first + peak.index);
  const name = `ACWR (${METRIC_INFO[settings.acwrMetric].short}, ${METHOD_WORDS[settings.acwrMethod]})`;
  const r = formatRatio(peak.value);
  const on = formatDayLabel(date);
  const note = early ? PROVISIONAL_NOTE : "";
  const base = { date, metric: settings.acwrMetric, value: peak.value, provisional: early };
  // Zones after Gabbett 2016 (BJSM 50:273): 0.8–1.3 "sweet spot", ≥1.5 "danger zone"; "≥" is the paper's own.
  if (atOrAbove(peak.value, settings.spikeRatio)) {
    return {
      ...base,
      kind: "spike",
      // A spike on a short history says more about missing history than about the athlete: caution, not alert.
      level: early ? "caution" : "alert",
      threshold: settings.spikeRatio,
      reason: `${name} ${r} on ${on} is at or above the spike threshold ${formatRatio(settings.spikeRatio)}.${note}`,
    };
  }
  if (atOrAbove(peak.value, settings.risingRatio)) {
    return {
      ...base,
      kind: "rising",
      level: "caution",
      threshold: settings.risingRatio,
      reason:
        `${name} peaks at ${r} on ${on}, at or above the climbing threshold ${formatRatio(settings.risingRatio)} ` +
        `and below the spike threshold ${formatRatio(settings.spikeRatio)}.${note}`,
    };
  }
  // No "underloaded" from early days (a short history compares with almost nothing), from a part-week (its
  // lightest days would decide it), or from missing logs alone (lib/load/README.md §7 and "Missing logs").
  if (!early && mayBeLow && peak.value < settings.lowRatio - 1e-9) {
    return {
      ...base,
      kind: "low",
      level: "info",
      threshold: settings.lowRatio,
      reason:
        `${name} stays below ${formatRatio(settings.lowRatio)} all week (highest ${r} on ${on}): ` +
        `this week is light compared with recent training.`,
    };
  }
  return null;
}

function hasMissing(input: FlagInput, from: number, to: number): boolean {
  const missing = input.missing;
  if (!missing) return false;
  for (let i = Math.max(0, from); i < Math.min(missing.length, to); i++) if (missing[i]) return true;
  return false;
}

/** Foster 1998 (MSSE 30:1164): monotony = daily mean ÷ SD of the week's sRPE loads; strain = weekly load × monotony. */
function monotonyFlag(input: FlagInput, w: number): Flag | null {
  const limit = input.settings.monotonyLimit ?? 2;
  const col = input.values.srpe;
  const m = monotonyOfWindow(
    col,
    w,
    7,
    DEFAULT_SD_TYPE,
    input.settings.missingLogs === "exclude" ? input.missing : undefined,
  );
  // Strictly above the limit ("above 2.0"); SD 0 (identical days) has no monotony and no flag.
  if (m === null || !(m > limit + 1e-9)) return null;
  const load = sumWindow(col, w, w + 7);
  const strain = load * m;
  return {
    kind: "monotony",
    level: "caution",
    date: input.weekStart,
    metric: "srpe",
    value: m,
    threshold: limit,
    reason:
      `Training monotony (sRPE, Foster) is ${formatNumber(m, 2)} this week, above ${formatNumber(limit, 1)}: ` +
      `the days are too alike to recover between them. ` +
      `Weekly load ${formatNumber(load)} AU, strain ${formatNumber(strain)}.`,
  };
}

function anyProvisional(provisional: ArrayLike<number | boolean>, from: number, to: number): boolean {
  for (let i = Math.max(0, from); i < to; i++) if (i >= provisional.length || provisional[i]) return true;
  return from < 0;
}

/** Settled spike, early spike, settled climbing, early climbing, underloaded: the week shows the first that applies. */
function zoneRank(f: Flag): number {
  if (f.kind === "spike") return f.provisional ? 4 : 5;
  if (f.kind === "rising") return f.provisional ? 2 : 3;
  return 1;
}

/**
 * The week's one ACWR zone flag (lib/load/README.md §7): the days with a full history behind them decide the
 * zone (their highest ratio; a spike there is an alert); the early days are judged on their own and give at
 * most a caution, shown only when it says more than the settled days do.
 */
function acwrFlag(input: FlagInput, from: number, to: number, first: number): Flag | null {
  const settled = peakRatioIn(input.ratio, from, to, input.provisional, false);
  const early = peakRatioIn(input.ratio, from, to, input.provisional, true);
  const mayBeLow = early === null && !anyProvisional(input.provisional, from, to) && !hasMissing(input, from, to);
  const candidates = [
    settled && zoneFlag(input, settled, first, false, mayBeLow),
    early && zoneFlag(input, early, first, true, false),
  ].filter((f): f is Flag => Boolean(f));
  return candidates.sort((a, b) => zoneRank(b) - zoneRank(a))[0] ?? null;
}

function jumpFlags(input: FlagInput, w: number): Flag[] {
  const { settings } = input;
  const out: Flag[] = [];
  for (const m of settings.jumpMetrics ?? DEFAULT_JUMP_METRICS) {
    const prev = sumWindow(input.values[m], w - 7, w);
    const cur = sumWindow(input.values[m], w, w + 7);
    const change = weeklyChangePct(prev, cur);
    // Strictly greater than the limit (Harrison & Johnston 2017, JSCR 31:2686: 15–49% weekly spikes).
    if (change === null || !exceedsWeeklyLimit(change, settings.weeklyChangeLimitPct)) continue;
    const info = METRIC_INFO[m];
    out.push({
      kind: "weekly_jump",
      level: "caution",
      date: input.weekStart,
      metric: m,
      value: change,
      threshold: settings.weeklyChangeLimitPct,
      reason:
        `${info.label}: ${formatNumber(cur, info.decimals)} ${info.unit} this week, up ${formatNumber(change, 1)}% ` +
        `on last week's ${formatNumber(prev, info.decimals)} ${info.unit}, ` +
        `more than the ${formatNumber(settings.weeklyChangeLimitPct, 1)}% limit.`,
    });
  }
  return out;
}

function plyoFlags(input: FlagInput, weekStartDay: number, weekEndDay: number): Flag[] {
  const level = input.profile.plyoLevel;
  const band = contactBand(level);
  const out: Flag[] = [];
  // The week's total sits next to the per-session band (lib/load/README.md §11.5).
  let weekTotal = 0;
  let weekWeighted: number | null = 0;
  for (const s of input.sessions) {
    const day = dayIndex(s.date);
    if (day < weekStartDay || day > weekEndDay) continue;
    weekTotal += s.contactsByIntensity.total;
    const w = s.contactsByIntensity.weighted;
    weekWeighted = weekWeighted === null || w === undefined ? null : weekWeighted + w;
  }
  const weighted = weekWeighted === null ? "" : ` (${formatNumber(weekWeighted)} weighted by intensity)`;
  const week = ` This week: ${formatNumber(weekTotal)} contacts in all${weighted}.`;
  for (const s of input.sessions) {
    const day = dayIndex(s.date);
    const contacts = s.contactsByIntensity.total;
    if (day < weekStartDay || day > weekEndDay || !aboveContactBand(contacts, level)) continue;
    out.push({
      kind: "plyo_volume",
      level: "caution",
      date: s.date,
      sessionId: s.id,
      metric: "contacts",
      value: contacts,
      threshold: band.max,
      // NSCA per-session ranges (Potach & Chu, Essentials 4th ed.) [from memory].
      reason:
        `The session on ${formatDayLabel(s.date)} has ${formatNumber(contacts)} ground contacts, ` +
        `above ${band.max}, the top of the ${level} range ` +
        `(${band.min}–${band.max} per session, the NSCA's off-season guidance).${week}`,
    });
  }
  return out;
}

function recoveryFlags(input: FlagInput, weekStartDay: number, weekEndDay: number): Flag[] {
  const hours = input.settings.recoveryHours;
  const hard = input.sessions
    .filter((s) => s.highIntensity)
    .map((s) => ({ s, at: dayIndex(s.date) * 1440 + minutesOfDay(s.startTime) }))
    .sort((a, b) => a.at - b.at);
  const out: Flag[] = [];
  for (let i = 1; i < hard.length; i++) {
    const prev = hard[i - 1];
    const cur = hard[i];
    const day = Math.floor(cur.at / 1440);
    const gapMin = cur.at - prev.at;
    // 48–72 h between plyometric sessions (NSCA) [from memory]; exactly recoveryHours passes.
    if (day < weekStartDay || day > weekEndDay || gapMin >= hours * 60) continue;
    const gapH = gapMin / 60;
    out.push({
      kind: "recovery",
      level: "caution",
      date: cur.s.date,
      sessionId: cur.s.id,
      value: gapH,
      threshold: hours,
      reason:
        `High-intensity sessions on ${formatDayLabel(prev.s.date)} ${prev.s.startTime} ` +
        `and ${formatDayLabel(cur.s.date)} ${cur.s.startTime} ` +
        `are ${formatNumber(gapH, gapH % 1 === 0 ? 0 : 1)} h apart, ` +
        `less than the ${formatNumber(hours)} h recovery window.`,
    });
  }
  return out;
}

/** Flags dated inside [weekStart, weekEnd], ordered by date then kind. */
export function computeFlags(input: FlagInput): Flag[] {
  const first = dayIndex(input.firstDate);
  const ws = dayIndex(input.weekStart);
  const we = input.weekEnd ? dayIndex(input.weekEnd) : ws + 6;
  const w = ws - first;
  const flags: Flag[] = [];
  const acwr = acwrFlag(input, w, we - first + 1, first);
  if (acwr) flags.push(acwr);
  flags.push(...jumpFlags(input, w), ...plyoFlags(input, ws, we), ...recoveryFlags(input, ws, we));
  const mono = monotonyFlag(input, w);
  if (mono) flags.push(mono);
  return flags.sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : KIND_ORDER[a.kind] - KIND_ORDER[b.kind]));
}

const LEVEL_RANK: Record<FlagLevel, number> = { alert: 3, caution: 2, info: 1 };

/** The most serious level among flags, or null when there are none. */
export function topFlagLevel(flags: readonly Flag[]): FlagLevel | null {
  let best: FlagLevel | null = null;
  for (const f of flags) if (best === null || LEVEL_RANK[f.level] > LEVEL_RANK[best]) best = f.level;
  return best;
}
