import Link from 'next/link';
import { CircuitSketch } from '@/components/landing/CircuitSketch';
import { LogoMark } from '@/components/shell/LogoMark';
import { SafetyNote } from '@/components/shell/SafetyNote';
import { ButtonLink } from '@/components/ui/ButtonLink';

const features = [
  {
    title: 'Draw with ISO 1219 symbols',
    body: 'Place cylinders, directional control valves, flow controls and sensors, tag them the way the trade does (1A1, 1V1, 1S1) and join ports with tubes of real length and bore.',
  },
  {
    title: 'Simulate with compressible-flow physics',
    body: 'Pressures rise and fall with tube volumes and sonic conductance, so cylinder speeds and valve switching times come out of the model instead of a guess.',
  },
  {
    title: 'Prove interlock rules over input timings',
    body: 'Write down what must never happen, such as a clamp opening while the press is down, and let Airproof try every input early, late and missing to see whether it can.',
  },
  {
    title: 'Review and replay field logs',
    body: 'Reviewers pin comments to a revision and approve it. Technicians load a log of inputs and sensor edges and replay it to see where machine and circuit part ways.',
  },
] as const;

export default function HomePage() {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="border-b border-rule">
        <div className="mx-auto flex max-w-6xl items-center px-4 py-3 sm:px-6">
          <Link href="/" className="flex items-center gap-2 rounded-md py-1 text-ink">
            <LogoMark className="size-7 text-accent" />
            <span className="text-lg font-semibold tracking-tight">Airproof</span>
          </Link>
        </div>
      </header>

      <main id="main" className="flex-1">
        <section className="mx-auto grid max-w-6xl gap-10 px-4 py-12 sm:px-6 md:grid-cols-[3fr_2fr] md:items-center md:py-20">
          <div>
            <p className="tag">pneumatic &amp; electro-pneumatic circuits</p>
            <h1 className="mt-4 text-3xl leading-tight sm:text-4xl">
              Prove the air circuit before the machine is built.
            </h1>
            <p className="mt-5 max-w-prose text-base text-ink-soft sm:text-lg">
              Airproof is a shared workbench for the people who put compressed air to work on a
              machine. Controls engineers draw a circuit and prove its interlock sequence before any
              part is ordered. Reviewers open the same circuit, comment on it and approve it.
              Commissioning technicians bring a recorded fault back from the floor and replay it
              against the circuit to find the part that explains it.
            </p>
            <div className="mt-8 flex flex-wrap gap-3">
              <ButtonLink href="/sign-in" variant="primary">
                Sign in
              </ButtonLink>
              <ButtonLink href="/circuits">Open circuits</ButtonLink>
            </div>
          </div>

          <figure className="rounded-lg border border-rule bg-paper-raised p-4 sm:p-6">
            <CircuitSketch className="w-full" />
            <figcaption className="mt-3 border-t border-rule pt-3 text-sm text-ink-soft">
              Demo data: Lid press cell LP-2 at Harrow Lane Packaging Works, a fictional plant.
            </figcaption>
          </figure>
        </section>

        <section aria-labelledby="features-heading" className="border-y border-rule bg-paper-raised">
          <div className="mx-auto max-w-6xl px-4 py-12 sm:px-6">
            <h2 id="features-heading" className="text-xl">
              One circuit, from first sketch to the shop floor
            </h2>
            <ol className="mt-8 grid gap-x-8 gap-y-10 sm:grid-cols-2 lg:grid-cols-4">
              {features.map((feature, index) => (
                <li key={feature.title} className="border-t-2 border-accent pt-4">
                  <span className="value text-sm text-accent-strong">
                    {String(index + 1).padStart(2, '0')}
                  </span>
                  <h3 className="mt-1 text-base">{feature.title}</h3>
                  <p className="mt-2 text-sm text-ink-soft">{feature.body}</p>
                </li>
              ))}
            </ol>
          </div>
        </section>
      </main>

      <footer className="mx-auto w-full max-w-6xl px-4 py-6 sm:px-6">
        <SafetyNote />
      </footer>
    </div>
  );
}
