"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { FormProvider, useForm } from "react-hook-form";
import type { AthleteProfile, TeamLoadSettings } from "@/lib/load/types";
import type { PlanTemplate } from "@/lib/plan/types";
import { applyServerErrors } from "@/lib/client/form-errors";
import { templateSchema, type TemplateInput } from "@/lib/validations/template";
import { Button } from "@/components/ui/button";
import { Field, Input } from "@/components/ui/field";
import { BlockFields } from "./block-fields";
import { BlockLoadPreview } from "./block-preview";
import { useConfirm } from "./confirm";
import { Dialog } from "./dialog";
import { FormFooter } from "./form-footer";

const BLANK: TemplateInput = {
  kind: "max_velocity",
  title: "",
  running: { sets: 1, reps: 4, distanceM: 30, intensityPct: 95, start: "flying", runInM: 20, restSec: 240 },
  drills: null,
  notes: "",
  durationMin: 45,
  plannedRpe: 6,
};

type Props = {
  template: PlanTemplate | null;
  open: boolean;
  onClose: () => void;
  onSave: (values: TemplateInput, template: Pick<PlanTemplate, "id" | "version"> | null) => Promise<void>;
  onDelete: (t: PlanTemplate) => Promise<void>;
  profile: AthleteProfile & { tested: boolean };
  settings: TeamLoadSettings;
};

/** Creates or edits a block template with the schema the handler parses, and shows its load as you type. */
export function TemplateEditor({ template, open, onClose, onSave, onDelete, profile, settings }: Props) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title={template ? `Edit block · ${template.title}` : "New block"}
      wide
      testId="template-editor"
    >
      <TemplateForm
        key={template?.id ?? "new"}
        template={template}
        onClose={onClose}
        onSave={onSave}
        onDelete={onDelete}
        profile={profile}
        settings={settings}
      />
    </Dialog>
  );
}

function TemplateForm({ template, onClose, onSave, onDelete, profile, settings }: Omit<Props, "open">) {
  const confirm = useConfirm();
  const form = useForm<TemplateInput>({
    resolver: zodResolver(templateSchema),
    defaultValues: template ? { ...template, notes: template.notes ?? "" } : BLANK,
    mode: "onBlur",
  });
  const [failure, setFailure] = useState<string | null>(null);
  const submit = form.handleSubmit(async (values) => {
    setFailure(null);
    try {
      await onSave(values, template);
      onClose();
    } catch (e) {
      applyServerErrors(form, e);
      setFailure(e instanceof Error ? e.message : "Could not save the block");
    }
  });
  const err = form.formState.errors;
  return (
    <FormProvider {...form}>
      <form onSubmit={submit} noValidate className="space-y-4" data-testid="template-form">
        <BlockFields />
        <div className="grid grid-cols-2 gap-3">
          <Field
            label="Session length when it starts a session (min)"
            htmlFor="durationMin"
            error={err.durationMin?.message}
          >
            <Input
              id="durationMin"
              type="number"
              {...form.register("durationMin", { valueAsNumber: true })}
              aria-invalid={Boolean(err.durationMin)}
            />
          </Field>
          <Field label="Planned RPE (CR-10)" htmlFor="plannedRpe" error={err.plannedRpe?.message}>
            <Input
              id="plannedRpe"
              type="number"
              step={0.5}
              {...form.register("plannedRpe", { valueAsNumber: true })}
              aria-invalid={Boolean(err.plannedRpe)}
            />
          </Field>
        </div>
        <BlockLoadPreview profile={profile} settings={settings} />
        {failure ? (
          <p role="alert" className="rounded-md bg-form-error-soft px-3 py-2 text-sm text-form-error">
            {failure}
          </p>
        ) : null}
        <FormFooter
          onClose={onClose}
          submitting={form.formState.isSubmitting}
          saveLabel="Save block"
          saveTestId="save-template"
          left={
            template ? (
              <Button
                variant="danger"
                onClick={async () => {
                  const ok = await confirm({
                    title: `Delete the block "${template.title}"?`,
                    body: "It leaves the shelf. Sessions that already use it keep their copy.",
                    confirmLabel: "Delete block",
                    danger: true,
                  });
                  if (!ok) return;
                  await onDelete(template);
                  onClose();
                }}
              >
                Delete block
              </Button>
            ) : undefined
          }
        />
      </form>
    </FormProvider>
  );
}
