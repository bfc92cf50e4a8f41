import { clsx } from "clsx";
import type { HTMLAttributes, ReactNode } from "react";

export function Card({ className, ...props }: HTMLAttributes<HTMLDivElement>) {
  return <div className={clsx("rounded-card bg-paper-raised shadow-card ring-1 ring-ink-100", className)} {...props} />;
}

export function PageHeader({ title, lead, actions }: { title: string; lead?: ReactNode; actions?: ReactNode }) {
  return (
    <header className="mb-6 flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
      <div>
        <h1 className="text-2xl font-semibold text-ink-950">{title}</h1>
        {lead ? <p className="mt-1 max-w-2xl text-sm text-ink-500">{lead}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </header>
  );
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-card border border-dashed border-ink-200 bg-paper-raised/60 px-6 py-10 text-center">
      <p className="font-medium text-ink-800">{title}</p>
      {children ? <div className="mt-1 text-sm text-ink-500">{children}</div> : null}
    </div>
  );
}
