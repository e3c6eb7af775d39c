/**
 * A control's words: in full on wide screens, `short` below 1280 px, where the toolbar has less
 * room (the sketch's title keeps its place). The control itself carries the full words as its aria-label, so its name never changes:
 * the short words are a part of the full ones, so a person who speaks the words they see (voice control) still names it.
 */
export function NarrowLabel({ full, short }: { full: string; short: string }) {
  return (
    <>
      <span className="max-xl:hidden">{full}</span>
      <span className="xl:hidden" aria-hidden="true">
        {short}
      </span>
    </>
  );
}
