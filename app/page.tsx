import Link from "next/link";
import { CautionFooter } from "@/components/site/CautionFooter";
import { HeroDiagram } from "@/components/site/HeroDiagram";
import { Wordmark } from "@/components/site/Wordmark";

const STEPS = [
  {
    title: "Draw the control volume",
    body: "Outline the body, place pins, rollers, contacts, ties and fixed supports, then the inlets and outlets where fluid crosses the boundary, with mass flow, velocity and gauge pressure.",
  },
  {
    title: "Read the reactions as you drag",
    body: "Linear momentum and moment of momentum are solved on every move. Lift-off, tipping and slip are named in words, with the support and the force it would need.",
  },
  {
    title: "Check, sign off, build on it",
    body: "Save versions, compare them, pin comments on a support, and carry a calculation from prepared to checked to approved. Fork it for the next design.",
  },
];

export default function HomePage() {
  return (
    <div className="flex min-h-screen flex-col">
      <header className="border-b border-rule/70">
        <nav className="mx-auto flex max-w-6xl items-center justify-between px-6 py-4" aria-label="Main">
          <Wordmark />
          <div className="flex items-center gap-3 text-sm">
            <Link href="/sign-in" className="rounded px-3 py-1.5 font-medium text-ink-soft hover:text-ink">
              Sign in
            </Link>
            <Link href="/sketches/new" className="rounded-md bg-ink px-3.5 py-1.5 font-medium text-paper hover:bg-ink-soft">
              Try a sketch
            </Link>
          </div>
        </nav>
      </header>

      <main className="flex-1">
        <section className="drafting-grid border-b border-rule/70">
          <div className="mx-auto grid max-w-6xl items-center gap-10 px-6 py-16 md:grid-cols-[1.05fr_1fr]">
            <div>
              <p className="text-xs font-semibold uppercase tracking-[0.18em] text-accent">Support reactions · momentum · pressure</p>
              <h1 className="mt-4 text-4xl font-semibold leading-tight tracking-tight md:text-5xl">
                What holds it in place when the fluid pushes back?
              </h1>
              <p className="mt-5 max-w-xl text-lg leading-relaxed text-ink-soft">
                Counterpoise finds the forces and moments at the supports of pump skids, pipe bends, monitors and thrust
                stands from the momentum and pressure of the flow through them — and tells you when a foot lifts, the
                body tips or a contact slides.
              </p>
              <div className="mt-8 flex flex-wrap gap-3">
                <Link href="/sketches/new" className="rounded-md bg-accent px-5 py-2.5 font-medium text-on-accent hover:bg-accent-deep">
                  Try a sketch — no account needed
                </Link>
                <Link href="/sign-in" className="rounded-md border border-ink/20 bg-paper-card px-5 py-2.5 font-medium hover:border-ink/40">
                  Sign in to your workspace
                </Link>
              </div>
            </div>
            <div className="paper-sheet rounded-lg border border-rule bg-paper-card p-4 shadow-[0_1px_0_rgb(var(--rule))]">
              <HeroDiagram />
              <p className="mt-2 border-t border-rule-soft pt-2 text-xs text-ink-faint">
                Solid arrows are given loads, dashed the momentum flux, double lines the reactions found.
              </p>
            </div>
          </div>
        </section>

        <section className="mx-auto grid max-w-6xl gap-8 px-6 py-14 md:grid-cols-3" aria-label="How it works">
          {STEPS.map((s, i) => (
            <div key={s.title} className="border-l-2 border-ink/15 pl-4">
              <p className="num text-sm font-semibold text-accent">0{i + 1}</p>
              <h2 className="mt-1 text-lg font-semibold">{s.title}</h2>
              <p className="mt-2 leading-relaxed text-ink-soft">{s.body}</p>
            </div>
          ))}
        </section>
      </main>

      <CautionFooter />
    </div>
  );
}
