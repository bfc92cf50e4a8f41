"use client";

import type { ReactNode } from "react";
import { Button } from "@/components/ui/button";

/** The bottom row of the editors: a destructive action on the left, close and save on the right. */
export function FormFooter({
  left,
  onClose,
  closeLabel = "Cancel",
  submitting,
  saveLabel,
  saveTestId,
}: {
  left?: ReactNode;
  onClose: () => void;
  closeLabel?: string;
  submitting: boolean;
  saveLabel: string;
  saveTestId: string;
}) {
  return (
    <div className="flex items-center justify-between gap-2 border-t border-ink-100 pt-4">
      {left ?? <span />}
      <div className="flex gap-2">
        <Button variant="secondary" onClick={onClose}>
          {closeLabel}
        </Button>
        <Button type="submit" disabled={submitting} data-testid={saveTestId}>
          {submitting ? "Saving…" : saveLabel}
        </Button>
      </div>
    </div>
  );
}
