// The cautions and the model's assumptions, beside every result. A wide window keeps them in a
// column beside the results; a narrower one (a 1280 px laptop) needs that room for the reactions
// table, so the short caution stays on a line of its own under the status and opens to the lists.
import { ASSUMPTIONS, CAUTION_SHORT, CAUTIONS } from "@/solver/cautions";
import { HEADING } from "@/components/editor/ui";

function CautionLists({ flows, titleId }: { flows: boolean; titleId?: string }) {
  return (
    <>
      <h2 id={titleId} className={`${HEADING} text-caution`}>
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
    </>
  );
}

/** The column beside the results, from 1400 px wide. */
export function CautionsAside({ flows }: { flows: boolean }) {
  return (
    // it scrolls when the cautions outgrow a short window, so the keyboard can reach it too
    <aside aria-labelledby="cautions-title" tabIndex={0} className="hidden w-[196px] shrink-0 overflow-y-auto border-l border-rule bg-caution-soft/30 px-3 py-2 text-[11.5px] leading-snug text-ink-soft min-[1400px]:block 2xl:w-[228px]" data-testid="cautions">
      <CautionLists flows={flows} titleId="cautions-title" />
    </aside>
  );
}

/** Below 1400 px: the short caution on one line, opening (a disclosure) to the full lists. */
export function CautionsLine({ flows }: { flows: boolean }) {
  return (
    <details className="group relative mt-1 text-[11.5px] leading-snug text-ink-soft min-[1400px]:hidden" data-testid="cautions-line">
      <summary className="cursor-pointer list-none rounded border border-caution/30 bg-caution-soft/30 px-2 py-0.5 marker:hidden">
        <span className="font-semibold text-caution">Caution · </span>
        {CAUTION_SHORT} <span className="whitespace-nowrap text-ink underline decoration-rule underline-offset-2 group-open:hidden">All cautions and the model</span>
        <span className="hidden whitespace-nowrap text-ink underline decoration-rule underline-offset-2 group-open:inline">Close</span>
      </summary>
      <div className="absolute inset-x-0 top-full z-20 mt-1 max-h-[220px] overflow-y-auto rounded border border-rule bg-paper px-3 py-2 shadow-lg">
        <CautionLists flows={flows} />
      </div>
    </details>
  );
}
