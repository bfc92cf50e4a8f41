import Image from "next/image";
import Link from "next/link";

export function Logo({ href = "/", compact = false }: { href?: string; compact?: boolean }) {
  return (
    <Link href={href} className="inline-flex items-center gap-2.5 font-semibold tracking-tight text-ink-950">
      <Image src="/logo.svg" alt="" width={28} height={28} priority unoptimized />
      {compact ? <span className="sr-only">Sprintwright</span> : <span className="text-lg">Sprintwright</span>}
    </Link>
  );
}
