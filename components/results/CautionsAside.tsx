// The cautions and the model's assumptions, beside every result.
import { ASSUMPTIONS, CAUTIONS } from "@/solver/cautions";
import { HEADING } from "@/components/editor/ui";

export function CautionsAside({ flows }: { flows: boolean }) {
  return (
    <aside aria-labelledby="cautions-title" className="w-[196px] shrink-0 2xl:w-[228px] overflow-y-auto border-l border-rule bg-caution-soft/30 px-3 py-2 text-[11.5px] leading-snug text-ink-soft" data-testid="cautions">
      <h2 id="cautions-title" className={`${HEADING} text-caution`}>
        Cautions
      </h2>
      <ul className="mt-1 list-disc space-y-1 pl-4">
        {CAUTIONS.filter((c) => flows || !/Steady-flow loads/.test(c)).map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
      <h2 className={`${HEADING} mt-2`}>Model</h2>
      <ul className="mt-1 list-disc space-y-1 pl-4">
        {ASSUMPTIONS.map((a) => (
          <li key={a}>{a}</li>
        ))}
      </ul>
    </aside>
  );
}
