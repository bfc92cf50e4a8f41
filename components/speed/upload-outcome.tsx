/** One refused line of an uploaded file, as the upload routes report it. */
export type UploadProblem = { line: number; column: string | null; message: string };

/** What an upload form shows under its button: the progress, the server's message and each refused line. */
export function UploadOutcome({
  share,
  message,
  problems,
  testId,
}: {
  /** Share of the file sent (0–1), or null before anything was sent. */
  share: number | null;
  message: string | null;
  problems: readonly UploadProblem[];
  /** Prefix of the data-testid of the message and the problem list ("upload" → upload-message, upload-problems). */
  testId: string;
}) {
  return (
    <>
      {share !== null ? (
        <div>
          <progress className="h-2 w-full" value={Math.round(share * 100)} max={100} aria-label="Upload progress" />
          <p className="text-xs text-ink-500" aria-live="polite">
            {share < 1 ? `Sending… ${Math.round(share * 100)} %` : "Sent"}
          </p>
        </div>
      ) : null}
      {message ? (
        <p role="status" className="text-sm text-ink-800" data-testid={`${testId}-message`}>
          {message}
        </p>
      ) : null}
      {problems.length ? (
        <ul className="space-y-1 text-sm text-form-error" data-testid={`${testId}-problems`}>
          {problems.map((p, i) => (
            <li key={i}>
              Line {p.line}
              {p.column ? ` (${p.column})` : ""}: {p.message}
            </li>
          ))}
        </ul>
      ) : null}
    </>
  );
}
