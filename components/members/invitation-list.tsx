"use client";

import { useState, useTransition } from "react";
import { withdrawInvitationAction } from "@/app/(workspace)/members/actions";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { ROLE_LABEL, type Role } from "@/lib/auth/roles";

type Invitation = { invitationId: number; email: string; role: Role; status: "invited" | "expired"; expiresAt: string };

/** Invitations nobody accepted yet: only the address the team typed, until its owner joins. */
export function InvitationList({ invitations }: { invitations: Invitation[] }) {
  const [error, setError] = useState<string>();
  const [pending, startTransition] = useTransition();
  if (invitations.length === 0) return null;
  return (
    <Card className="mt-6 overflow-hidden" data-testid="invitation-list">
      <h2 className="border-b border-ink-100 px-4 py-3 font-semibold text-ink-950">Invited, not joined yet</h2>
      <p className="px-4 pt-2 text-xs text-ink-500">
        They get no alerts, digests or team data until they accept. Add the address again to send a fresh link.
      </p>
      {error ? (
        <p role="alert" className="mx-4 mt-2 rounded-lg bg-form-error-soft px-3 py-2 text-sm text-form-error">
          {error}
        </p>
      ) : null}
      <ul className="divide-y divide-ink-50" aria-busy={pending}>
        {invitations.map((i) => (
          <li
            key={i.invitationId}
            className="flex items-center justify-between gap-3 px-4 py-3"
            data-testid="invitation-row"
          >
            <div className="min-w-0">
              <p className="truncate font-medium text-ink-900">
                {i.email}{" "}
                {i.status === "expired" ? <Badge tone="spike">expired</Badge> : <Badge tone="climb">invited</Badge>}
              </p>
              <p className="text-sm text-ink-500">
                {ROLE_LABEL[i.role]} ·{" "}
                {i.status === "expired"
                  ? "link expired"
                  : `link works until ${new Date(i.expiresAt).toLocaleDateString("en-GB")}`}
              </p>
            </div>
            <Button
              variant="secondary"
              size="sm"
              disabled={pending}
              onClick={() =>
                startTransition(async () => {
                  setError(undefined);
                  const result = await withdrawInvitationAction(i.invitationId);
                  if (!result.ok) setError(result.message);
                })
              }
            >
              Withdraw
            </Button>
          </li>
        ))}
      </ul>
    </Card>
  );
}
