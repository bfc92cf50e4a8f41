import Link from "next/link";
import { getServerSession } from "next-auth";
import { Logo } from "@/components/shell/logo";
import { buttonClass } from "@/components/ui/button";
import { LoadCaution } from "@/components/ui/caution";
import { authOptions } from "@/lib/auth/options";

const ROLES = [
  {
    who: "Coaches",
    what:
      "Build each athlete's week from acceleration, max-velocity and plyometric blocks. " +
      "Drop a block on a day and see HSR metres, near-max metres, ground contacts, sRPE and ACWR change before you commit.",
  },
  {
    who: "Athletes",
    what:
      "Get every session on your phone's calendar through a personal feed, " +
      "read it in plain words, and log what you actually did in under a minute.",
  },
  {
    who: "Physios",
    what:
      "See the whole squad's load, set restrictions the planner enforces, " +
      "get an e-mail and an in-app alert the moment a spike is planned or happens (or a coach plans past a restriction), " +
      "and follow up on each alert with a note.",
  },
];

export default async function LandingPage() {
  const session = await getServerSession(authOptions);
  return (
    <div className="min-h-dvh bg-paper">
      <header className="mx-auto flex max-w-6xl items-center justify-between px-5 py-5">
        <Logo />
        <Link href={session ? "/home" : "/sign-in"} className={buttonClass({ variant: "secondary", size: "sm" })}>
          {session ? "Open Sprintwright" : "Sign in"}
        </Link>
      </header>
      <main className="mx-auto max-w-6xl px-5 pb-20">
        <section className="grid gap-10 py-12 md:grid-cols-[1.2fr_1fr] md:py-20">
          <div>
            <p className="text-sm font-semibold tracking-widest text-clay-600 uppercase">For people who coach speed</p>
            <h1 className="mt-4 text-3xl font-semibold text-ink-950 md:text-4xl">
              Faster athletes, planned one week at a time, without the hamstring bill.
            </h1>
            <p className="mt-5 max-w-xl text-lg text-ink-600">
              Top speed is built by hard, short ground contacts: the same sessions that overload hamstrings, Achilles
              tendons and shins when volume jumps. Sprintwright keeps each athlete&apos;s high-speed metres and contacts
              progressive against their own tested max velocity, and tells the physio before a spike turns into an
              injury.
            </p>
            <div className="mt-8 flex flex-wrap gap-3">
              <Link href="/sign-in" className={buttonClass({ variant: "accent", size: "lg" })}>
                Sign in to your club
              </Link>
            </div>
          </div>
          <div className="rounded-card bg-ink-950 p-6 text-paper shadow-lift">
            <p className="text-xs font-semibold tracking-widest text-lane-300 uppercase">This week · Maya Okafor</p>
            <dl className="mt-5 grid grid-cols-2 gap-4">
              {[
                ["HSR metres", "640 m"],
                ["Near-max metres", "210 m"],
                ["Ground contacts", "412"],
                ["ACWR (EWMA)", "1.18"],
              ].map(([k, v]) => (
                <div key={k} className="rounded-lg bg-ink-900 p-3">
                  <dt className="text-xs text-ink-300">{k}</dt>
                  <dd className="mt-1 text-xl font-semibold">{v}</dd>
                </div>
              ))}
            </dl>
            <p className="mt-5 text-sm text-ink-300">
              Steady week: inside the team&apos;s ratio band and under the weekly jump limit.
            </p>
          </div>
        </section>
        <section className="grid gap-4 md:grid-cols-3">
          {ROLES.map((r) => (
            <article key={r.who} className="rounded-card bg-paper-raised p-6 shadow-card ring-1 ring-ink-100">
              <h2 className="text-lg font-semibold text-ink-950">{r.who}</h2>
              <p className="mt-2 text-sm text-ink-600">{r.what}</p>
            </article>
          ))}
        </section>
        <LoadCaution className="mt-10" />
      </main>
    </div>
  );
}
