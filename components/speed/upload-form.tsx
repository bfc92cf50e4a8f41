"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { UploadOutcome, type UploadProblem } from "./upload-outcome";
import { inputClass } from "@/components/ui/field";
import { ApiError } from "@/lib/client/fetcher";
import { speedKeys } from "@/lib/client/keys";
import { speedApi } from "@/lib/client/speed";

/** Uploads a timing-gate CSV with a progress bar; shows every problem line by line when it is refused. */
export function TimingUploadForm({ teamId }: { teamId: number }) {
  const router = useRouter();
  const [share, setShare] = useState<number | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const [problems, setProblems] = useState<UploadProblem[]>([]);

  async function onFile(file: File | undefined) {
    if (!file) return;
    setMessage(null);
    setProblems([]);
    setShare(0);
    try {
      const content = await file.text();
      const result = await speedApi.uploadTiming(teamId, { fileName: file.name, content }, setShare);
      setShare(1);
      setMessage(
        `Saved ${result.trials.length} trial${result.trials.length === 1 ? "" : "s"}. Accept a result below to use it.`,
      );
      router.refresh();
    } catch (e) {
      setShare(null);
      setMessage(e instanceof Error ? e.message : "The upload failed");
      if (e instanceof ApiError && Array.isArray(e.details.problems))
        setProblems(e.details.problems as UploadProblem[]);
    }
  }

  return (
    <div className="space-y-3" data-testid="timing-upload">
      <label htmlFor="timing-file" className="block text-sm font-medium text-ink-800">
        Timing-gate file (CSV)
      </label>
      <input
        id="timing-file"
        type="file"
        accept=".csv,text/csv"
        className={inputClass}
        aria-describedby="timing-file-hint"
        onChange={(e) => void onFile(e.target.files?.[0])}
      />
      <p id="timing-file-hint" className="text-xs text-ink-500">
        One row per gate: athlete, date, trial, start, distance_m, time_s, body_mass_kg.{" "}
        <a href={speedKeys.templates.timing} download className="font-medium text-lane-700 underline">
          Download the template
        </a>
        . Nothing is saved unless every line is right.
      </p>
      <UploadOutcome share={share} message={message} problems={problems} testId="upload" />
    </div>
  );
}
