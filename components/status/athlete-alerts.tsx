"use client";

import { useState } from "react";
import { AlertCard } from "@/components/notices/alert-card";
import { EmptyState } from "@/components/ui/card";
import type { AlertRow } from "@/lib/data/alerts";

/** The athlete's alert history, newest first; open ones can be acknowledged and resolved with a note here. */
export function AthleteAlerts({ initial, canManage }: { initial: AlertRow[]; canManage: boolean }) {
  const [alerts, setAlerts] = useState(initial);
  if (alerts.length === 0) return <EmptyState title="No alerts for this athlete" />;
  return (
    <div className="space-y-3" data-testid="athlete-alerts">
      {alerts.map((a) => (
        <AlertCard
          key={a.id}
          alert={a}
          canManage={canManage}
          onChange={(updated) => setAlerts((list) => list.map((x) => (x.id === updated.id ? updated : x)))}
        />
      ))}
    </div>
  );
}
