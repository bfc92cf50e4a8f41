import Link from "next/link";
import { buttonClass } from "@/components/ui/button";

export const metadata = { title: "Not for your role" };

export default function NotAllowedPage() {
  return (
    <div
      className="mx-auto max-w-lg rounded-card bg-paper-raised p-8 text-center shadow-card ring-1 ring-ink-100"
      data-testid="not-allowed"
    >
      <h1 className="text-xl font-semibold text-ink-950">Not for your role</h1>
      <p className="mt-2 text-sm text-ink-600">
        This screen is for other members of your club. If you think you need it, ask your head coach to change your
        role.
      </p>
      <Link href="/home" className={buttonClass({ variant: "secondary", className: "mt-6" })}>
        Back to today
      </Link>
    </div>
  );
}
