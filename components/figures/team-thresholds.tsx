import { formatNumber, formatRatio } from "@/lib/load/format";
import { METRIC_INFO, type AcwrMethod, type TeamLoadSettings } from "@/lib/load/types";

const METHOD: Record<AcwrMethod, string> = {
  ewma: "EWMA over 7 and 28 days",
  rolling_coupled: "rolling averages, coupled (7 ÷ 28 days)",
  rolling_uncoupled: "rolling averages, uncoupled (7 ÷ the 21 days before)",
};

/** The team's lines as they stand now (Thresholds screen). */
export function TeamThresholds({ settings }: { settings: TeamLoadSettings }) {
  const rows: [string, string][] = [
    [
      "High-speed running",
      settings.speedZones === "relative"
        ? `at or above ${formatNumber(settings.hsrPct)} % of the athlete's own vmax (relative zones)`
        : `at or above ${formatNumber(settings.hsrSpeedMs, 1)} m/s (${formatNumber(settings.hsrSpeedMs * 3.6, 1)} km/h)`,
    ],
    ["Near-max running", `at or above ${formatNumber(settings.nearMaxPct)} % of the athlete's own vmax`],
    ["Acute:chronic ratio", `${METHOD[settings.acwrMethod]}, judged on ${METRIC_INFO[settings.acwrMetric].label}`],
    ["Spike", `ratio at or above ${formatRatio(settings.spikeRatio)}`],
    [
      "Climbing",
      `ratio at or above ${formatRatio(settings.risingRatio)} and below ${formatRatio(settings.spikeRatio)}`,
    ],
    ["Underloaded", `ratio below ${formatRatio(settings.lowRatio)} on every day of a week with a full history`],
    ["Weekly jump", `more than ${formatNumber(settings.weeklyChangeLimitPct, 1)} % up on the week before`],
    ["Recovery window", `${formatNumber(settings.recoveryHours)} h between high-intensity sessions`],
    ["Monotony", `sRPE monotony above ${formatNumber(settings.monotonyLimit, 1)}`],
    ["Sessions nobody logged", settings.missingLogs === "estimate" ? "the plan counts as an estimate" : "left out"],
  ];
  return (
    <dl className="grid gap-x-6 gap-y-1 sm:grid-cols-[12rem_1fr]" data-testid="figures-team-thresholds">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="font-medium text-ink-800">{k}</dt>
          <dd className="text-ink-700">{v}</dd>
        </div>
      ))}
    </dl>
  );
}
