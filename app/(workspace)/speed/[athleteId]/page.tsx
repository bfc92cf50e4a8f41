import Link from "next/link";
import { notFound } from "next/navigation";
import { Badge } from "@/components/ui/badge";
import { Card, PageHeader } from "@/components/ui/card";
import { AcceptResultButton } from "@/components/speed/accept-button";
import { FitChart } from "@/components/speed/fit-chart";
import { HistoryChart } from "@/components/speed/history-chart";
import { ContactTests, TraceTests } from "@/components/speed/measure-tests";
import { MeasureUploadForm } from "@/components/speed/measure-upload-form";
import { TypedContactsForm } from "@/components/speed/typed-contacts-form";
import { pageAthlete } from "@/lib/auth/page-access";
import { scopeOf } from "@/lib/auth/permissions";
import { BASELINE_FROM } from "@/lib/data/speed-profiles";
import { getAthleteSpeed, listTraceSessionChoices } from "@/lib/data/speed-views";
import { getTeamLoadSettings } from "@/lib/data/team-settings";
import { addDays } from "@/lib/dates/plain-date";
import { teamToday } from "@/lib/dates/zoned";
import type { SpeedProfileValues } from "@/lib/speed/profile-values";
import type { TimingTrialAnalysis } from "@/lib/speed/timing-trial";

export const metadata = { title: "Speed profile" };

const VALUES: { key: keyof SpeedProfileValues; label: string; unit: string; digits: number }[] = [
  { key: "vmaxMs", label: "Max velocity", unit: "m/s", digits: 2 },
  { key: "tauS", label: "τ (acceleration time constant)", unit: "s", digits: 2 },
  { key: "f0N", label: "F0 (no air drag)", unit: "N", digits: 0 },
  { key: "pmaxW", label: "Pmax (no air drag)", unit: "W", digits: 0 },
  { key: "stepLengthM", label: "Step length", unit: "m", digits: 2 },
  { key: "stepFrequencyHz", label: "Step frequency", unit: "Hz", digits: 2 },
  { key: "contactTimeS", label: "Contact time", unit: "s", digits: 3 },
  { key: "stanceForceBw", label: "Mean stance force", unit: "× BW", digits: 2 },
];

export default async function SpeedProfilePage({ params }: { params: Promise<{ athleteId: string }> }) {
  const { athleteId } = await params;
  const viewer = await pageAthlete(Number(athleteId), "speed:view");
  const today = teamToday({ timeZone: viewer.timeZone, now: new Date() });
  const [{ athlete, entries, replaced, tests: allTests, squadRange, measured }, settings] = await Promise.all([
    getAthleteSpeed({ teamId: viewer.teamId, athleteId: viewer.athlete.id }),
    getTeamLoadSettings({ teamId: viewer.teamId }),
  ]);
  if (!athlete) notFound();
  const canEdit = scopeOf(viewer.role, "speed:edit") === "team";
  const sessions = canEdit
    ? await listTraceSessionChoices({
        teamId: viewer.teamId,
        athleteId: athlete.id,
        from: addDays(today, -56),
        to: today,
      })
    : [];
  const tests = allTests.filter((t) => t.kind === "timing");
  const tested = entries.filter((e) => e.effectiveFrom !== BASELINE_FROM);
  const current = entries.at(-1);
  const previous = entries.at(-2);
  const fallback: Partial<SpeedProfileValues> = {
    vmaxMs: athlete.vmaxMs,
    tauS: athlete.tauS,
    stepLengthM: athlete.stepLengthM,
  };
  return (
    <>
      <PageHeader
        title={`${athlete.name}: speed profile`}
        lead="Each value against this athlete's own earlier tests; the squad's range is shown only as context."
        actions={
          <Link href="/speed" className="text-sm font-medium text-lane-700 underline">
            Speed lab
          </Link>
        }
      />
      <div className="grid gap-4 sm:grid-cols-2 xl:grid-cols-4" data-testid="speed-profile">
        {VALUES.map(({ key, label, unit, digits }) => {
          const now = current ? current[key] : (fallback[key] ?? null);
          const before = previous ? previous[key] : null;
          const change = now !== null && before !== null && current?.speedTestId ? now - before : null;
          const points = tested
            .filter((e) => e[key] !== null)
            .map((e) => ({ date: e.effectiveFrom, value: e[key] as number }));
          const range = key in squadRange ? squadRange[key as keyof typeof squadRange] : null;
          return (
            <Card key={key} className="p-4" data-testid={`profile-${key}`}>
              <h2 className="text-sm font-medium text-ink-500">{label}</h2>
              <p className="text-2xl font-semibold text-ink-900 tabular-nums" data-testid={`current-${key}`}>
                {now === null ? "not measured yet" : `${now.toFixed(digits)} ${unit}`}
              </p>
              <p className="text-xs text-ink-500">
                {change === null
                  ? "No change on record yet"
                  : `${change >= 0 ? "+" : "−"}${Math.abs(change).toFixed(digits)} ${unit} since the test before`}
              </p>
              {points.length > 1 ? <HistoryChart points={points} unit={unit} label={label} /> : null}
              {range ? (
                <p className="mt-1 text-xs text-ink-400">
                  Squad now: {range.min.toFixed(digits)}–{range.max.toFixed(digits)} {unit} ({range.n} athletes)
                </p>
              ) : null}
            </Card>
          );
        })}
      </div>
      <p className="mt-2 text-xs text-ink-500" data-testid="no-drag-note">
        F0 and Pmax are the no-air-drag form: F0 = body mass × vmax ÷ τ, Pmax = F0 × vmax ÷ 4. The published air-drag
        correction needs constants for the athlete&apos;s frontal area and drag that we have not checked against the
        paper, so it is not applied; at top speed air resistance is only a few per cent of the total.
      </p>
      <h2 className="mt-6 mb-2 text-lg font-semibold text-ink-900">Profile history</h2>
      <Card className="p-4">
        {entries.length === 0 ? (
          <p className="text-sm text-ink-700">
            No test accepted yet: the load figures use the values typed on the athlete form.
          </p>
        ) : (
          <ul className="divide-y divide-ink-100 text-sm" data-testid="profile-history">
            {entries.map((e) => (
              <li key={e.id} className="flex flex-wrap justify-between gap-2 py-2">
                <span className="font-medium text-ink-900">
                  {e.effectiveFrom === BASELINE_FROM ? "Before the first test" : `From ${e.effectiveFrom}`}
                </span>
                <span className="text-ink-700 tabular-nums">
                  vmax {e.vmaxMs?.toFixed(2) ?? "–"} m/s · τ {e.tauS?.toFixed(2) ?? "–"} s
                </span>
                <span className="text-xs text-ink-500">
                  {e.speedTestId
                    ? `accepted by ${e.acceptedByName ?? "a former member"} on ${e.acceptedAt.toISOString().slice(0, 10)}`
                    : "typed in"}
                </span>
                {replaced
                  .filter((r) => r.effectiveFrom === e.effectiveFrom)
                  .map((r) => (
                    <span key={r.id} className="w-full text-xs text-ink-500" data-testid="profile-replaced">
                      Replaced: vmax {r.values.vmaxMs?.toFixed(2) ?? "–"} m/s · τ {r.values.tauS?.toFixed(2) ?? "–"} s,
                      accepted by {r.acceptedByName ?? "a former member"} on {r.acceptedAt.toISOString().slice(0, 10)};
                      replaced by {r.replacedByName ?? "a former member"} on {r.replacedAt.toISOString().slice(0, 10)}
                    </span>
                  ))}
              </li>
            ))}
          </ul>
        )}
      </Card>
      <h2 className="mt-6 mb-2 text-lg font-semibold text-ink-900">Timing tests</h2>
      <div className="space-y-4">
        {tests.map((t) => {
          const r = t.result as TimingTrialAnalysis;
          return (
            <Card key={t.id} id={`test-${t.id}`} className="p-4" data-testid={`test-${t.id}`}>
              <div className="flex flex-wrap items-center justify-between gap-2">
                <h3 className="font-semibold text-ink-900">
                  Timing trial · {t.testDate} · {t.startType ?? ""} start
                </h3>
                {t.accepted ? (
                  <Badge tone="steady">In use from {t.testDate}</Badge>
                ) : canEdit && r.fit ? (
                  <AcceptResultButton teamId={viewer.teamId} testId={t.id} testDate={t.testDate} />
                ) : null}
              </div>
              {r.fit ? (
                <>
                  <p className="mt-1 text-sm text-ink-800 tabular-nums" data-testid={`fit-${t.id}`}>
                    Fit: vmax {r.fit.vmax.toFixed(2)} m/s ({(r.fit.vmax * 3.6).toFixed(1)} km/h) · τ{" "}
                    {r.fit.tau.toFixed(2)} s · time residuals RMS {(r.fit.rmseTimeS * 1000).toFixed(1)} ms
                    {r.profile
                      ? ` · F0 ${r.profile.f0N.toFixed(0)} N · V0 ${r.profile.v0.toFixed(2)} m/s · ` +
                        `Pmax ${r.profile.pmaxW.toFixed(0)} W (no air drag)`
                      : ""}
                  </p>
                  <FitChart vmax={r.fit.vmax} tau={r.fit.tau} intervals={r.intervals} gates={r.splits} />
                </>
              ) : (
                <p className="mt-1 text-sm text-ink-700">No fit: at least two timed gates are needed.</p>
              )}
              <ul className="mt-2 grid gap-1 text-xs text-ink-700 sm:grid-cols-2">
                {r.intervals.map((iv) => (
                  <li key={`${iv.fromM}-${iv.toM}`} className="tabular-nums">
                    {iv.fromM}–{iv.toM} m: {iv.seconds.toFixed(3)} s · {iv.speed.ms.toFixed(2)} m/s (
                    {iv.speed.kmh.toFixed(1)} km/h)
                  </li>
                ))}
                {r.bestFlying ? (
                  <li className="font-medium">
                    Best flying: {r.bestFlying.fromM}–{r.bestFlying.toM} m at {r.bestFlying.speed.ms.toFixed(2)} m/s
                  </li>
                ) : null}
              </ul>
            </Card>
          );
        })}
        {tests.length === 0 ? <p className="text-sm text-ink-700">No tests yet.</p> : null}
      </div>
      {canEdit ? (
        <Card className="mt-6 p-4">
          <h2 className="mb-3 text-base font-semibold text-ink-900">Add a speed trace, force trace or contact file</h2>
          <MeasureUploadForm teamId={viewer.teamId} athleteId={athlete.id} today={today} sessions={sessions} />
        </Card>
      ) : null}
      {canEdit ? (
        <Card className="mt-4 p-4">
          <h2 className="mb-3 text-base font-semibold text-ink-900">Type in contact measurements</h2>
          <TypedContactsForm teamId={viewer.teamId} athleteId={athlete.id} today={today} />
        </Card>
      ) : null}
      <h2 className="mt-6 mb-2 text-lg font-semibold text-ink-900">Speed traces</h2>
      <TraceTests
        tests={allTests.filter((t) => t.kind === "trace")}
        measured={measured}
        settings={settings}
        teamId={canEdit ? viewer.teamId : null}
      />
      <h2 className="mt-6 mb-2 text-lg font-semibold text-ink-900">Contacts and force</h2>
      <ContactTests
        tests={allTests.filter((t) => t.kind === "force" || t.kind === "contacts")}
        teamId={canEdit ? viewer.teamId : null}
      />
    </>
  );
}
