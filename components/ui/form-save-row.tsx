import { Button } from "@/components/ui/button";

/** What a settings form says after a save: "ok" in the steady colour, "error" in the spike colour. */
export type SaveMessage = { tone: "ok" | "error"; text: string };

/** A settings form's submit button and its outcome line (a polite live region, so screen readers hear it). */
export function FormSaveRow(props: {
  label: string;
  saving: boolean;
  dirty: boolean;
  message?: SaveMessage;
  testId: string;
}) {
  return (
    <div className="flex flex-wrap items-center gap-3">
      <Button type="submit" disabled={props.saving || !props.dirty} data-testid={props.testId}>
        {props.saving ? "Saving…" : props.label}
      </Button>
      {props.message ? (
        <p role="status" className={props.message.tone === "ok" ? "text-sm text-form-ok" : "text-sm text-form-error"}>
          {props.message.text}
        </p>
      ) : null}
    </div>
  );
}
