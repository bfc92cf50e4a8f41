import { Badge } from "@/components/ui/badge";
import { Card } from "@/components/ui/card";
import { AcceptResultButton } from "@/components/speed/accept-button";
import { TraceChart } from "@/components/speed/trace-chart";
import { PlanMeasuredTable } from "@/components/speed/plan-measured-table";
import type { SpeedTestView } from "@/lib/data/speed-views";
import type { PlanMeasured } from "@/lib/speed/plan-measured";
import type { TeamLoadSettings } from "@/lib/load/types";
import type { ContactRowsAnalysis, ForceTraceAnalysis } from "@/lib/speed/contact-analysis";
import { TRACE_SMOOTHING_S, type SpeedTraceAnalysis } from "@/lib/speed/speed-trace";

// The speed lab's traces and contact files on an athlete's page (lib/speed/README.md §8, §9).

/** "In use" when accepted; the accept button for coaches (`teamId` given) when there is something to accept. */
function AcceptSlot({ test, teamId, can }: { test: SpeedTestView; teamId: number | null; can: boolean }) {
  if (test.accepted) return <Badge tone="steady">In use from {test.testDate}</Badge>;
  if (teamId === null || !can) return null;
  return <AcceptResultButton teamId={teamId} testId={test.id} testDate={test.testDate} />;
}

const f = (v: number | null | undefined, digits: number, unit = "") =>
  v === null || v === undefined || !Number.isFinite(v) ? "–" : `${v.toFixed(digits)}${unit}`;

/** Speed traces: vmax (smoothed), τ, band metres; a trace of a planned session next to the planned figures. */
export function TraceTests({
  tests,
  measured,
  settings,
  teamId,
}: {
  tests: SpeedTestView[];
  measured: PlanMeasured[];
  /** Given when the viewer may accept results. */
  teamId: number | null;
  settings: Pick<TeamLoadSettings, "hsrSpeedMs" | "hsrPct" | "nearMaxPct" | "speedZones">;
}) {
  if (tests.length === 0) return <p className="text-sm text-ink-700">No speed traces yet.</p>;
  return (
    <div className="space-y-4">
      {tests.map((t) => {
        const r = t.result as SpeedTraceAnalysis;
        const chart = (t.data as { chart?: { t: number; v: number }[] }).chart ?? [];
        const m = measured.find((x) => x.testId === t.id);
        const hsrLine =
          settings.speedZones === "relative" ? (r.bandVmaxMs * settings.hsrPct) / 100 : settings.hsrSpeedMs;
        return (
          <Card key={t.id} id={`test-${t.id}`} className="p-4" data-testid={`trace-${t.id}`}>
            <div className="flex flex-wrap items-center justify-between gap-2">
              <h3 className="font-semibold text-ink-900">Speed trace · {t.testDate}</h3>
              <AcceptSlot test={t} teamId={teamId} can={r.fit !== null} />
            </div>
            <p className="mt-1 text-sm text-ink-800 tabular-nums" data-testid={`trace-summary-${t.id}`}>
              vmax {f(r.vmaxMs, 2, " m/s")} ({TRACE_SMOOTHING_S} s average; highest sample {f(r.rawPeakMs, 2, " m/s")})
              · τ {r.fit ? f(r.fit.tau, 2, " s") : "no fit"} · {f(r.distanceM, 0, " m")} in all · HSR{" "}
              {f(r.hsrM, 0, " m")} · near-max {f(r.nearMaxM, 0, " m")} · {f(r.samplingHz, 0, " Hz")}
            </p>
            <p className="text-xs text-ink-500">
              Bands from vmax {f(r.bandVmaxMs, 2, " m/s")} (the profile in force that day): HSR line{" "}
              {f(hsrLine, 2, " m/s")}, near-max {settings.nearMaxPct} % ={" "}
              {f((r.bandVmaxMs * settings.nearMaxPct) / 100, 2, " m/s")}.
            </p>
            {m ? <PlanMeasuredTable m={m} /> : null}
            {chart.length > 1 ? (
              <TraceChart
                points={chart}
                hsrLineMs={hsrLine}
                nearMaxLineMs={(r.bandVmaxMs * settings.nearMaxPct) / 100}
              />
            ) : null}
          </Card>
        );
      })}
    </div>
  );
}

/** Force traces and contact-mat files: each contact and the mean, and step time ÷ contact time beside it. */
export function ContactTests({ tests, teamId }: { tests: SpeedTestView[]; teamId: number | null }) {
  if (tests.length === 0) return <p className="text-sm text-ink-700">No force traces or contact files yet.</p>;
  return (
    <div className="space-y-4">
      {tests.map((t) =>
        t.kind === "force" ? (
          <ForceCard key={t.id} test={t} teamId={teamId} />
        ) : (
          <ContactRowsCard key={t.id} test={t} teamId={teamId} />
        ),
      )}
    </div>
  );
}

const th = "py-1 pr-3 text-left text-xs font-medium text-ink-500 whitespace-nowrap";
const td = "py-1 pr-3 whitespace-nowrap";

function ForceCard({ test, teamId }: { test: SpeedTestView; teamId: number | null }) {
  const r = test.result as ForceTraceAnalysis;
  return (
    <Card id={`test-${test.id}`} className="p-4" data-testid={`force-${test.id}`}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="font-semibold text-ink-900">
          Force trace · {test.testDate} · {r.mode === "jump" ? "jump" : `${r.contacts.length} contacts`}
        </h3>
        <AcceptSlot test={test} teamId={teamId} can={r.mode === "contacts" && r.means.contactTimeS !== null} />
      </div>
      <p className="text-xs text-ink-500">
        {f(r.samplingHz, 0, " Hz")}, body mass {f(r.bodyMassKg, 1, " kg")}, contact above {r.thresholdN} N.
      </p>
      {r.mode === "jump" ? (
        r.jump ? (
          <p className="mt-1 text-sm text-ink-800 tabular-nums" data-testid={`jump-${test.id}`}>
            Take-off velocity {f(r.jump.takeOffVelocityMs, 2, " m/s")} · height by impulse–momentum{" "}
            {f(r.jump.heightByImpulseM * 100, 1, " cm")} · by flight time{" "}
            {r.jump.heightByFlightTimeM === null
              ? "no landing in the trace"
              : f(r.jump.heightByFlightTimeM * 100, 1, " cm")}
          </p>
        ) : (
          <p className="mt-1 text-sm text-ink-700">The trace never leaves the plate.</p>
        )
      ) : (
        <>
          <p className="mt-1 text-sm text-ink-800 tabular-nums" data-testid={`force-means-${test.id}`}>
            Mean: contact {f(r.means.contactTimeS, 3, " s")} · flight {f(r.means.flightTimeS, 3, " s")} · step frequency{" "}
            {f(r.means.stepFrequencyHz, 2, " Hz")} · peak {f(r.means.peakN, 0, " N")} ({f(r.means.peakBw, 2, " × BW")})
            · mean stance force {f(r.means.meanBw, 2, " × BW")}; step time ÷ contact time{" "}
            {f(r.means.impliedStanceBw, 2, " × BW")}
          </p>
          <div className="relative mt-2 overflow-x-auto">
            <table className="text-sm tabular-nums">
              <caption className="sr-only">Each contact</caption>
              <thead>
                <tr>
                  {[
                    "#",
                    "Contact s",
                    "Flight s",
                    "Step Hz",
                    "Peak N",
                    "Peak × BW",
                    "Mean × BW",
                    "Impulse N·s",
                    "Net N·s",
                    "Δv m/s",
                  ].map((h) => (
                    <th key={h} scope="col" className={th}>
                      {h}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {r.contacts.slice(0, 30).map((c, i) => (
                  <tr key={i} className="border-t border-ink-100">
                    <td className={td}>{i + 1}</td>
                    <td className={td}>{f(c.contactTimeS, 3)}</td>
                    <td className={td}>{f(c.flightTimeS, 3)}</td>
                    <td className={td}>{f(c.stepFrequencyHz, 2)}</td>
                    <td className={td}>{f(c.peakN, 0)}</td>
                    <td className={td}>{f(c.peakBw, 2)}</td>
                    <td className={td}>{f(c.meanBw, 2)}</td>
                    <td className={td}>{f(c.impulseNs, 1)}</td>
                    <td className={td}>{f(c.netImpulseNs, 1)}</td>
                    <td className={td}>{f(c.deltaVerticalMs, 2)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
    </Card>
  );
}

function ContactRowsCard({ test, teamId }: { test: SpeedTestView; teamId: number | null }) {
  const r = test.result as ContactRowsAnalysis | null;
  if (!r) return null;
  return (
    <Card id={`test-${test.id}`} className="p-4" data-testid={`contacts-${test.id}`}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="font-semibold text-ink-900">
          Contact measurements · {test.testDate} · {r.rows.length} contacts
        </h3>
        <AcceptSlot test={test} teamId={teamId} can />
      </div>
      <p className="mt-1 text-sm text-ink-800 tabular-nums" data-testid={`contacts-means-${test.id}`}>
        Mean: contact {f(r.means.contactTimeS, 3, " s")} · flight {f(r.means.flightTimeS, 3, " s")} · step frequency{" "}
        {f(r.means.stepFrequencyHz, 2, " Hz")} · step length {f(r.means.stepLengthM, 2, " m")} · mean stance force (step
        time ÷ contact time) {f(r.means.stanceForceBw, 2, " × BW")}
      </p>
      <p className="text-xs text-ink-500">
        Over a whole step the vertical impulse equals body weight × step time, so the stance force in body weights is
        step time ÷ contact time.
      </p>
      <div className="relative mt-2 overflow-x-auto">
        <table className="text-sm tabular-nums">
          <caption className="sr-only">Each contact</caption>
          <thead>
            <tr>
              {["#", "Contact s", "Flight s", "Step Hz", "Step m", "Stance × BW"].map((h) => (
                <th key={h} scope="col" className={th}>
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {r.rows.slice(0, 30).map((c, i) => (
              <tr key={i} className="border-t border-ink-100">
                <td className={td}>{i + 1}</td>
                <td className={td}>{f(c.contactTimeS, 3)}</td>
                <td className={td}>{f(c.flightTimeS, 3)}</td>
                <td className={td}>{f(c.stepFrequencyHz, 2)}</td>
                <td className={td}>{f(c.stepLengthM, 2)}</td>
                <td className={td}>{f(c.stanceForceBw, 2)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </Card>
  );
}
