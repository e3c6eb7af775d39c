/**
 * A control's words: in full on wide screens, `short` below 1024 px, where the toolbar has less
 * room. The control itself carries the full words as its aria-label, so its name never changes.
 */
export function NarrowLabel({ full, short }: { full: string; short: string }) {
  return (
    <>
      <span className="max-lg:hidden">{full}</span>
      <span className="lg:hidden" aria-hidden="true">
        {short}
      </span>
    </>
  );
}
