import { CAUTIONS } from "@/solver/cautions";

export function CautionFooter() {
  return (
    <footer className="border-t border-rule bg-paper-deep/60">
      <div className="mx-auto grid max-w-6xl gap-6 px-6 py-8 text-sm text-ink-soft md:grid-cols-[1fr_2fr]">
        <div>
          <p className="font-semibold text-ink">Counterpoise</p>
          <p className="mt-1">Support reactions for equipment that fluid flows through.</p>
        </div>
        <section aria-labelledby="cautions-heading" className="rounded-md border border-caution/30 bg-caution-soft/60 p-4">
          <h2 id="cautions-heading" className="text-xs font-semibold uppercase tracking-wider text-caution">
            Engineering cautions
          </h2>
          <ul className="mt-2 list-disc space-y-1 pl-5">
            {CAUTIONS.map((c) => (
              <li key={c}>{c}</li>
            ))}
          </ul>
        </section>
      </div>
    </footer>
  );
}
