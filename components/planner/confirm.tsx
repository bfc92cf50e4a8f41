"use client";

import { createContext, useCallback, useContext, useState, type ReactNode } from "react";
import { Button } from "@/components/ui/button";
import { Dialog } from "./dialog";

export type ConfirmRequest = { title: string; body: string; confirmLabel: string; danger?: boolean };
type Pending = ConfirmRequest & { resolve: (ok: boolean) => void };
type Confirm = (request: ConfirmRequest) => Promise<boolean>;

const ConfirmContext = createContext<Confirm>(async () => false);

/** Asks before a change athletes will notice (publish, cancel, clear): our own dialog, not the browser's. */
export function useConfirm(): Confirm {
  return useContext(ConfirmContext);
}

export function ConfirmProvider({ children }: { children: ReactNode }) {
  const [pending, setPending] = useState<Pending | null>(null);
  const confirm = useCallback<Confirm>(
    (request) => new Promise<boolean>((resolve) => setPending({ ...request, resolve })),
    [],
  );
  const settle = (ok: boolean) => {
    pending?.resolve(ok);
    setPending(null);
  };
  return (
    <ConfirmContext.Provider value={confirm}>
      {children}
      <Dialog
        open={pending !== null}
        onClose={() => settle(false)}
        title={pending?.title ?? ""}
        testId="confirm-dialog"
      >
        <p className="text-sm text-ink-600">{pending?.body}</p>
        <div className="mt-5 flex justify-end gap-2">
          <Button variant="secondary" onClick={() => settle(false)} data-testid="confirm-no">
            Keep as it is
          </Button>
          <Button
            variant={pending?.danger ? "danger" : "primary"}
            onClick={() => settle(true)}
            data-testid="confirm-yes"
            autoFocus
          >
            {pending?.confirmLabel}
          </Button>
        </div>
      </Dialog>
    </ConfirmContext.Provider>
  );
}

/** The question before deleting a session: a draft goes; a published one is cancelled for the athlete. */
export function removeQuestion(s: { title: string; status: string }): ConfirmRequest {
  return s.status === "published"
    ? {
        title: `Cancel "${s.title}"?`,
        body: "Athletes who have it in their calendar will see it cancelled. You can undo this.",
        confirmLabel: "Cancel session",
        danger: true,
      }
    : {
        title: `Delete "${s.title}"?`,
        body: "The draft is removed. You can undo this.",
        confirmLabel: "Delete draft",
        danger: true,
      };
}
