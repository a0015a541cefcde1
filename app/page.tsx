import Link from "next/link";
import { redirect } from "next/navigation";
import { Wordmark } from "@/components/brand/logo-mark";
import { buttonClass } from "@/components/ui/button";
import { homeFor } from "@/lib/navigation";
import { sessionActor } from "@/lib/server/auth/request-actor";

const POINTS = [
  {
    title: "Ladders with a standard on every rung",
    body: "Write the progression once: what to do, how to cue it, and what 'ready' means, in numbers.",
  },
  {
    title: "Athletes log on their phones",
    body: "Each athlete sees their own rung in every slot of the block, logs holds and reps, and flags pain.",
  },
  {
    title: "Promotions you can explain",
    body: "The engine moves people up when the standard is met, or asks you first, and always says why.",
  },
];

export default async function LandingPage() {
  const actor = await sessionActor();
  if (actor) redirect(homeFor(actor.role));
  return (
    <div className="mx-auto flex min-h-dvh max-w-5xl flex-col px-4 py-8">
      <header className="flex items-center justify-between">
        <Wordmark />
        <Link href="/sign-in" className={buttonClass("secondary")}>
          Sign in
        </Link>
      </header>
      <main className="flex flex-1 flex-col justify-center py-16">
        <p className="font-mono text-sm uppercase tracking-widest text-ember">For skill coaches</p>
        <h1 className="mt-3 max-w-3xl font-display text-5xl font-bold leading-tight tracking-tight">
          Move every athlete up the right rung, the day they're ready.
        </h1>
        <p className="mt-5 max-w-2xl text-lg text-muted">
          Rungwise keeps hand balancing, rings, lever and press progressions for your whole squad in one place, and
          shows you each Monday who is ready, who is stuck and who is hurting.
        </p>
        <div className="mt-8 flex gap-3">
          <Link href="/sign-up" className={buttonClass("primary", "lg")}>
            Start a team
          </Link>
          <Link href="/sign-in" className={buttonClass("secondary", "lg")}>
            I have an invite
          </Link>
        </div>
        <ul className="mt-16 grid gap-4 sm:grid-cols-3">
          {POINTS.map((point) => (
            <li key={point.title} className="rounded-card border border-line bg-surface p-5">
              <p className="font-display text-lg font-semibold">{point.title}</p>
              <p className="mt-2 text-sm text-muted">{point.body}</p>
            </li>
          ))}
        </ul>
      </main>
      <footer className="text-center text-xs text-muted">
        Rungwise does not replace a qualified coach, physiotherapist or physician.
      </footer>
    </div>
  );
}
