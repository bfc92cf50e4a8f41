"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { UploadOutcome, type UploadProblem } from "./upload-outcome";
import { Button } from "@/components/ui/button";
import { Field, Input, Select, inputClass } from "@/components/ui/field";
import { ApiError } from "@/lib/client/fetcher";
import { speedKeys } from "@/lib/client/keys";
import { speedApi } from "@/lib/client/speed";

type Kind = "trace" | "force" | "contacts";

const KINDS: { value: Kind; label: string; columns: string }[] = [
  { value: "trace", label: "Speed trace (radar, laser, GPS; 10 Hz or more)", columns: "time_s, speed_ms" },
  { value: "force", label: "Vertical force trace (force plate; 500 Hz or more)", columns: "time_s, force_n" },
  {
    value: "contacts",
    label: "Contact measurements (contact mat, optical)",
    columns: "contact_time_s, flight_time_s, step_length_m",
  },
];

/** One athlete's speed trace, force trace or contact file, with a progress bar and every problem by line. */
export function MeasureUploadForm({
  teamId,
  athleteId,
  today,
  sessions,
}: {
  teamId: number;
  athleteId: number;
  today: string;
  sessions: { id: number; date: string; title: string }[];
}) {
  const router = useRouter();
  const [kind, setKind] = useState<Kind>("trace");
  const [testDate, setTestDate] = useState(today);
  const [sessionId, setSessionId] = useState("");
  const [bodyMass, setBodyMass] = useState("");
  const [file, setFile] = useState<File | null>(null);
  const [share, setShare] = useState<number | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const [problems, setProblems] = useState<UploadProblem[]>([]);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const layout = KINDS.find((k) => k.value === kind)!;
  const session = sessions.find((s) => String(s.id) === sessionId);

  async function onSubmit(e: React.FormEvent) {
    e.preventDefault();
    if (!file) {
      setMessage("Choose a file first");
      return;
    }
    setMessage(null);
    setProblems([]);
    setFields({});
    setShare(0);
    try {
      const content = await file.text();
      await speedApi.uploadMeasure(
        teamId,
        {
          kind,
          fileName: file.name,
          content,
          athleteId,
          testDate: session ? session.date : testDate,
          plannedSessionId: kind === "trace" && session ? session.id : null,
          bodyMassKg: bodyMass.trim() === "" ? null : Number(bodyMass),
        },
        setShare,
      );
      setShare(1);
      setMessage(`Saved ${file.name}.`);
      router.refresh();
    } catch (err) {
      setShare(null);
      setMessage(err instanceof Error ? err.message : "The upload failed");
      if (err instanceof ApiError) {
        if (Array.isArray(err.details.problems)) setProblems(err.details.problems as UploadProblem[]);
        setFields(err.fields ?? {});
      }
    }
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" data-testid="measure-upload">
      <Field label="What the file holds" htmlFor="measure-kind">
        <Select id="measure-kind" value={kind} onChange={(e) => setKind(e.target.value as Kind)}>
          {KINDS.map((k) => (
            <option key={k.value} value={k.value}>
              {k.label}
            </option>
          ))}
        </Select>
      </Field>
      {kind === "trace" ? (
        <Field
          label="Planned session (optional)"
          htmlFor="measure-session"
          error={fields.plannedSessionId?.[0]}
          hint="The trace becomes the session's measured running load, shown next to the plan."
        >
          <Select id="measure-session" value={sessionId} onChange={(e) => setSessionId(e.target.value)}>
            <option value="">No session</option>
            {sessions.map((s) => (
              <option key={s.id} value={s.id}>
                {s.date} · {s.title}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      {!session || kind !== "trace" ? (
        <Field label="Date" htmlFor="measure-date" error={fields.testDate?.[0]}>
          <Input
            id="measure-date"
            type="date"
            value={testDate}
            max={today}
            onChange={(e) => setTestDate(e.target.value)}
            aria-invalid={!!fields.testDate}
          />
        </Field>
      ) : null}
      {kind !== "trace" ? (
        <Field
          label="Body mass, kg (optional)"
          htmlFor="measure-mass"
          error={fields.bodyMassKg?.[0]}
          hint="Else the athlete's body mass; forces are also shown in body weights."
        >
          <Input
            id="measure-mass"
            inputMode="decimal"
            value={bodyMass}
            onChange={(e) => setBodyMass(e.target.value)}
            aria-invalid={!!fields.bodyMassKg}
          />
        </Field>
      ) : null}
      <div className="space-y-1.5">
        <label htmlFor="measure-file" className="block text-sm font-medium text-ink-800">
          File (CSV)
        </label>
        <input
          id="measure-file"
          type="file"
          accept=".csv,text/csv"
          className={inputClass}
          aria-describedby="measure-file-hint"
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
        />
        <p id="measure-file-hint" className="text-xs text-ink-500">
          Columns: {layout.columns}.{" "}
          <a href={speedKeys.templates[kind]} download className="font-medium text-lane-700 underline">
            Download the template
          </a>
          . Nothing is saved unless every line is right.
        </p>
      </div>
      <Button type="submit" disabled={share !== null && share < 1} data-testid="measure-send">
        Upload
      </Button>
      <UploadOutcome share={share} message={message} problems={problems} testId="measure" />
    </form>
  );
}
