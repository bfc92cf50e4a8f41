import Link from "next/link";

export default function NotFound() {
  return (
    <div className="flex min-h-dvh flex-col items-center justify-center gap-3 bg-paper px-4 text-center">
      <h1 className="text-2xl font-semibold text-ink-950">Page not found</h1>
      <Link href="/" className="text-sm font-medium text-lane-700 underline">
        Go to the start page
      </Link>
    </div>
  );
}
