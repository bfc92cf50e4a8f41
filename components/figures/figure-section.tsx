import type { ReactNode } from "react";
import { Card } from "@/components/ui/card";
import type { FiguresTopic } from "@/lib/load/figures-link";

/** One explained figure: an anchor other screens link to, a title, and plain words. */
export function FigureSection({
  id,
  title,
  children,
}: {
  id: FiguresTopic | string;
  title: string;
  children: ReactNode;
}) {
  return (
    <Card id={id} className="scroll-mt-6 p-5" data-testid={`figures-${id}`}>
      <h2 className="text-base font-semibold text-ink-900">{title}</h2>
      <div className="mt-2 space-y-2 text-sm leading-relaxed text-ink-700">{children}</div>
    </Card>
  );
}

/** A formula set apart from the prose. */
export function Formula({ children }: { children: ReactNode }) {
  return <p className="rounded-lg bg-paper-sunk px-3 py-2 font-mono text-xs text-ink-800">{children}</p>;
}

/** Where a formula comes from, or what we chose where the literature leaves it open. */
export function Source({ children }: { children: ReactNode }) {
  return <p className="text-xs text-ink-500">{children}</p>;
}
