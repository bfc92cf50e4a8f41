/**
 * Sprintwright load engine: pure, isomorphic maths (no I/O, no clock, no React). Route handlers and the
 * planner's drag preview call the same functions, so the number a coach sees while dragging is the number stored.
 *
 * Model choices (sources and check values: lib/load/README.md; pinned by tests/unit/load):
 * - Dates are local calendar dates "YYYY-MM-DD" handled as integer day numbers (lib/dates/plain-date.ts, ISO
 *   weekdays 1 = Monday … 7 = Sunday); "today" is always an input.
 * - Running reps follow the mono-exponential model v(t) = target·(1 − e^(−t/τ)) from rest (Furusawa, Hill &
 *   Parkinson 1927), target = intensityPct% of vmax; a flying rep's run-in is run and counted. HSR and near-max
 *   metres are the analytic metres at or above the threshold; a threshold at or above the target gives 0.
 *   Untested athletes use DEFAULT_VMAX 9.0 m/s, DEFAULT_TAU 1.2 s, DEFAULT_STEP_LENGTH 2.1 m [from memory].
 * - Sprint metres = acceleration + max-velocity + speed-endurance metres (tempo is not sprinting);
 *   sprint steps = sprint metres ÷ step length (an estimate).
 * - sRPE = RPE × minutes (Foster 2001). Logs: completion yes/partly/no = 1/0.5/0 unless per-block reps are
 *   logged; "no" is a logged 0; a null RPE or minutes falls back to the plan × completion. A published session
 *   before today without a log is "missing", not a rest day (its day counts 0 and is marked).
 * - "projected" = logged work + the plan from today on (drafts included, cancelled excluded).
 * - ACWR: EWMA (Williams 2017, λ = 2/(N+1), N = 7 and 28) seeded with the first day's load (pandas
 *   ewm(adjust=False)); rolling coupled = mean of 7 ÷ mean of 28 days (Hulin 2016); rolling uncoupled =
 *   mean of 7 ÷ mean of days t−27…t−7 (Lolli 2019, Gabbett 2019). One series per athlete × metric × view,
 *   from the athlete's first day on record (nothing padded before it; days without sessions are 0), whatever
 *   range the caller shows (README §5). Ratios with < 28 days on record are provisional; chronic 0 → null.
 * - Monotony = mean ÷ SD with the population SD by default (Foster 1998); SD 0 → null.
 * - Boundaries: ACWR ≥ spike (1.5) is a spike, [rising 1.3, spike) climbing, < low (0.8) underloaded, judged on
 *   the week's settled (non-provisional) days, early days giving at most a caution (Gabbett 2016 zones; README §7);
 *   weekly change strictly > 15% is a jump (so exactly 15% passes),
 *   checked on settings.jumpMetrics (default sRPE, HSR, near-max, contacts); contacts strictly above the NSCA
 *   band's top are an overload; high-intensity sessions (max-velocity block or high plyometrics) less than 48 h
 *   apart by wall clock are a short recovery (exactly 48 h passes). Comparisons allow 1e-9 of float noise.
 * - Flags are monitoring aids, not diagnoses: show LOAD_CAUTION with them.
 * - Input: sessions and logs as plain objects; readers of a few days take the stored series from the ledger
 *   (ledger.ts, README §12) instead of the whole history.
 */
// Only what callers import from "@/lib/load"; everything else is imported from its own module.
export * from "./types";
export { prescribedReps } from "./block-metrics";
export type { Flag, FlagLevel } from "./flags";
export type { WeekSummary } from "./week-summary";
export { computeAthleteLoad, type AthleteLoad } from "./athlete-load";
