import Link from "next/link";
import { buttonClass } from "@/components/ui/button";

export default function WorkspaceNotFound() {
  return (
    <div
      className="mx-auto max-w-lg rounded-card bg-paper-raised p-8 text-center shadow-card ring-1 ring-ink-100"
      data-testid="not-found"
    >
      <h1 className="text-xl font-semibold text-ink-950">Nothing here</h1>
      <p className="mt-2 text-sm text-ink-600">This page does not exist, or it belongs to another team.</p>
      <Link href="/home" className={buttonClass({ variant: "secondary", className: "mt-6" })}>
        Back to today
      </Link>
    </div>
  );
}
