"use client";

import { useState, useTransition } from "react";
import { changeRoleAction, removeMemberAction } from "@/app/(workspace)/members/actions";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Select } from "@/components/ui/field";
import { ROLES, ROLE_LABEL, type Role } from "@/lib/auth/roles";

type Member = { membershipId: number; userId: number; name: string; email: string; role: Role };

export function MemberList({ members, viewerUserId }: { members: Member[]; viewerUserId: number }) {
  const [error, setError] = useState<string>();
  const [pending, startTransition] = useTransition();

  const run = (fn: () => Promise<{ ok: boolean; message?: string }>) =>
    startTransition(async () => {
      setError(undefined);
      const result = await fn();
      if (!result.ok) setError(result.message);
    });

  return (
    <Card className="overflow-hidden">
      {error ? (
        <p role="alert" className="border-b border-ink-100 bg-form-error-soft px-4 py-2 text-sm text-form-error">
          {error}
        </p>
      ) : null}
      <ul className="divide-y divide-ink-50" data-testid="member-list" aria-busy={pending}>
        {members.map((m) => (
          <li
            key={m.membershipId}
            className="flex flex-col gap-3 px-4 py-3 sm:flex-row sm:items-center sm:justify-between"
            data-testid="member-row"
          >
            <div className="min-w-0">
              <p className="truncate font-medium text-ink-900">{m.name}</p>
              <p className="truncate text-sm text-ink-500">{m.email}</p>
            </div>
            <div className="flex items-center gap-2">
              <label className="sr-only" htmlFor={`role-${m.membershipId}`}>
                Role of {m.name}
              </label>
              <Select
                id={`role-${m.membershipId}`}
                className="w-36"
                value={m.role}
                disabled={pending}
                onChange={(e) => run(() => changeRoleAction(m.membershipId, { role: e.target.value }))}
              >
                {ROLES.map((r) => (
                  <option key={r} value={r}>
                    {ROLE_LABEL[r]}
                  </option>
                ))}
              </Select>
              {m.userId === viewerUserId ? null : (
                <Button
                  variant="danger"
                  size="sm"
                  disabled={pending}
                  onClick={() => {
                    if (window.confirm(`Remove ${m.name} from the club? Their training history stays.`))
                      run(() => removeMemberAction(m.membershipId));
                  }}
                >
                  Remove
                </Button>
              )}
            </div>
          </li>
        ))}
      </ul>
    </Card>
  );
}
