import Link from "next/link";
import { Brand } from "@/components/brand";
import { SafetyCaution } from "@/components/safety-caution";
import { buttonClasses } from "@/components/ui/button";
import { getSignedInUser } from "@/lib/server/work-context";

const STEPS = [
  {
    title: "Vet the route",
    text: "Drop in the GPX of the trip. Fadeline cleans the track, finds every descent and measures its drop, length and steepest pitch.",
  },
  {
    title: "Describe each rig",
    text: "Tow vehicle, trailer or caravan, and the load: masses, brakes, tyres, engine braking and trailer brake type. Masses are checked against their ratings.",
  },
  {
    title: "See where brakes get hot",
    text: "For every rig in the convoy, Fadeline follows brake temperature down each descent and marks where pads fade or fluid may boil.",
  },
  {
    title: "Brief the group",
    text: "The plan says which gear, what speed, and where to stop to let the brakes cool, and re-runs the model to show the advice works.",
  },
];

export default async function LandingPage() {
  const user = await getSignedInUser();
  return (
    <div className="min-h-dvh">
      <header className="mx-auto flex max-w-6xl items-center justify-between px-4 py-5">
        <Brand />
        <nav className="flex items-center gap-2">
          {user ? (
            <Link href="/plans" className={buttonClasses("primary") + " no-underline"}>Open Fadeline</Link>
          ) : (
            <>
              <Link href="/sign-in" className={buttonClasses("ghost") + " no-underline"}>Sign in</Link>
              <Link href="/sign-up" className={buttonClasses("primary") + " no-underline"}>Create an account</Link>
            </>
          )}
        </nav>
      </header>
      <main className="mx-auto max-w-6xl px-4 pb-16">
        <section className="grid gap-10 py-10 md:grid-cols-[1.2fr_1fr] md:items-center">
          <div>
            <p className="text-sm font-semibold uppercase tracking-wider text-pine-700">Brake-heat planning for towing</p>
            <h1 className="mt-3 text-4xl font-semibold tracking-tight sm:text-5xl">
              Know which hills will cook your brakes before you tow down them.
            </h1>
            <p className="mt-5 max-w-xl text-lg text-ink-soft">
              A loaded ute with a caravan can weigh six tonnes. On a long descent its brakes turn that height into heat,
              and hot pads fade. Fadeline works out, for your rig on your route, where that happens and what to do
              instead: gear, speed and cool-down stops.
            </p>
            <div className="mt-7 flex flex-wrap gap-3">
              <Link href={user ? "/plans" : "/sign-up"} className={buttonClasses("primary", "lg") + " no-underline"}>
                {user ? "Go to your plans" : "Start planning"}
              </Link>
              {!user && <Link href="/sign-in" className={buttonClasses("secondary", "lg") + " no-underline"}>Sign in</Link>}
            </div>
          </div>
          <HeatProfile />
        </section>
        <section aria-labelledby="how" className="py-8">
          <h2 id="how" className="text-2xl font-semibold tracking-tight">For tour operators, caravan owners and guides</h2>
          <ol className="mt-6 grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
            {STEPS.map((step, i) => (
              <li key={step.title} className="rounded-[var(--radius-card)] border border-line bg-surface p-5">
                <span className="text-sm font-semibold text-pine-700">{i + 1}</span>
                <h3 className="mt-1 font-semibold">{step.title}</h3>
                <p className="mt-2 text-sm text-ink-soft">{step.text}</p>
              </li>
            ))}
          </ol>
        </section>
        <SafetyCaution className="mt-6" />
      </main>
    </div>
  );
}

/** A drawn illustration of a heat trace along a descent (not data). */
function HeatProfile() {
  return (
    <figure className="rounded-[var(--radius-card)] border border-line bg-surface p-5">
      <svg viewBox="0 0 320 170" role="img" aria-label="Illustration: a road profile falling from left to right, coloured from cool to hot as the brakes heat up" className="w-full">
        <defs>
          <linearGradient id="heat" x1="0" x2="1">
            <stop offset="0" stopColor="var(--color-heat-cool)" />
            <stop offset="0.45" stopColor="var(--color-heat-warm)" />
            <stop offset="0.75" stopColor="var(--color-heat-hot)" />
            <stop offset="1" stopColor="var(--color-heat-boil)" />
          </linearGradient>
        </defs>
        <path d="M10 30 C60 32 80 50 120 70 S200 110 240 125 S300 140 310 142 L310 160 L10 160 Z" fill="var(--color-sunken)" />
        <path d="M10 30 C60 32 80 50 120 70 S200 110 240 125 S300 140 310 142" stroke="url(#heat)" strokeWidth="6" fill="none" strokeLinecap="round" />
        <circle cx="240" cy="125" r="6" fill="var(--color-surface)" stroke="var(--color-heat-hot)" strokeWidth="3" />
      </svg>
      <figcaption className="mt-2 text-xs text-ink-muted">
        Cool, warm, hot, boil risk: the four classes Fadeline gives every step of a descent.
      </figcaption>
    </figure>
  );
}
