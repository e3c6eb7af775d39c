"use client";
// The result in words above the tables: one sentence per body, and a plain note when the result
// shown is an earlier one because the input has errors.
import { useDeferredValue, useMemo } from "react";
import { useAnalysis, useEditor } from "@/canvas/context";
import { errorInWords } from "./errorPlace";
import { useResultForceUnit } from "./useHeldScale";
import { stabilitySentence, statusSentences, type Tone } from "./statusSentence";

const BADGE: Record<Tone, { word: string; cls: string }> = {
  holds: { word: "Holds", cls: "border-ink/40 text-ink" },
  // holds as a whole, one contact over its own μ: not the body sliding away
  strained: { word: "Over μ", cls: "border-dashed border-caution text-caution" },
  lifts: { word: "Lifts", cls: "border-dashed border-caution text-caution" },
  slips: { word: "Slips", cls: "border-dashed border-caution text-caution" },
  tips: { word: "Tips", cls: "border-caution bg-caution text-on-accent" },
  unrestrained: { word: "Free", cls: "border-caution bg-caution text-on-accent" },
};

/** a body held with a tie gone slack and every contact still bearing: nothing has lifted off */
const SLACK = { ...BADGE.lifts, word: "Slack" };
const TIPS_AND_SLIDES = { ...BADGE.tips, word: "Tips, slides" };
/** slides first, then tips (by the factors of safety): the badge puts the first first, as the sentence does */
const SLIDES_THEN_TIPS = { ...BADGE.tips, word: "Slides, tips" };

/** The errors after the first, each on its own line (a few; the fields are marked in the panel). */
const MORE_SHOWN = 4;
function MoreErrors({ words }: { words: string[] }) {
  if (!words.length) return null;
  return (
    <span className="mt-0.5 block" data-testid="more-errors">
      {words.slice(0, MORE_SHOWN).map((w, i) => (
        <span key={i} className="block">
          — {w}
        </span>
      ))}
      {words.length > MORE_SHOWN ? <span className="block">and {words.length - MORE_SHOWN} more</span> : null}
    </span>
  );
}

/** A body that holds but falls short of a required factor of safety: the badge says so, not "Holds". */
const SHORT = { word: "FoS short", cls: "border-caution bg-caution text-on-accent" };
/** short of a factor with a contact lifted off: both, the governing check first, as the headline says them */
const SHORT_LIFTS = { ...SHORT, word: "FoS short, lifts" };

/** The body's factors of safety as drawn, under its status: in the caution colour when one falls short. */
function StabilityLine({ sentence }: { sentence: { text: string; pass: boolean } | null }) {
  if (!sentence) return null;
  return (
    <p className={`text-[12px] leading-snug ${sentence.pass ? "text-ink-soft" : "font-semibold text-caution"}`} data-testid="stability-as-drawn" data-pass={sentence.pass}>
      {sentence.text}.
    </p>
  );
}

export function StatusBanner() {
  // deferred: a drag's frames come first, the panel catches up when the main thread is free
  const shown = useDeferredValue(useAnalysis((s) => s.shown));
  const numeric = useDeferredValue(useAnalysis((s) => s.shownSketch));
  const stability = useDeferredValue(useAnalysis((s) => s.shownStability));
  const stale = useAnalysis((s) => s.stale);
  const errors = useAnalysis((s) => s.core?.errors ?? []);
  const analysed = useAnalysis((s) => s.sketch);
  const hasBody = useEditor((s) => s.sketch.bodies.length > 0);
  const units = useEditor((s) => s.units);
  // every force in the result's one unit, as the table and the drawing beside the words write it
  const forceUnit = useResultForceUnit(units);
  const sentences = useMemo(() => (shown && numeric ? statusSentences(numeric, shown, units, forceUnit, stability ?? undefined, analysed) : []), [shown, numeric, units, forceUnit, stability, analysed]);
  // the errors after the first, in words: under the faded result or the missing one
  const more = useMemo(() => errors.slice(1).map((e) => errorInWords(analysed, e)), [errors, analysed]);

  if (!hasBody) return <p className="text-[13px] text-ink-faint" data-testid="status">Draw a body, then its supports, to see the reactions.</p>;
  return (
    <div className="space-y-1" data-testid="status">
      {stale && (
        <p className="rounded border border-caution/50 bg-caution-soft px-2 py-1 text-[12px] text-caution" data-testid="stale">
          Showing the last good result (faded on the drawing): the input has {errors.length === 1 ? "an error" : `${errors.length} errors`}
          {errors[0] ? ` — ${errorInWords(analysed, errors[0])}` : ""}
          <MoreErrors words={more} />
        </p>
      )}
      {!shown && !stale && errors.length > 0 && (
        <p className="rounded border border-caution/50 bg-caution-soft px-2 py-1 text-[12px] text-caution">
          No result yet: {errorInWords(analysed, errors[0])}
          <MoreErrors words={more} />
        </p>
      )}
      {sentences.map((s) => {
        const factors = numeric ? stabilitySentence(numeric, s.body, stability?.[s.body]) : null;
        // a body held (a tie slack beside bearing contacts, a contact lifted off included) that falls
        // short of a required factor: the badge says so, as the headline does, and a lift-off after it
        const short = !!s.short;
        // a body that tips and slides: both in the badge, as in the sentence
        const badge = short ? (s.tone === "lifts" && !s.slackOnly ? SHORT_LIFTS : SHORT) : s.alsoSlips && s.tone === "tips" ? (s.first === "slides" ? SLIDES_THEN_TIPS : TIPS_AND_SLIDES) : s.slackOnly ? SLACK : BADGE[s.tone];
        return (
          <div key={s.body} className={`grid grid-cols-[auto_minmax(0,1fr)] gap-x-2 ${stale ? "opacity-60" : ""}`}>
            {/* the badge and the headline read as one sentence; the details line up under the headline */}
            <p className="contents text-[14px] font-semibold leading-snug text-ink" data-testid="status-sentence" data-tone={s.tone} data-short={short || undefined}>
              <span className={`mt-[2px] h-fit self-start whitespace-nowrap rounded border px-1.5 py-[1px] text-[10.5px] font-semibold uppercase tracking-wider ${badge.cls}`} data-testid="status-badge">
                {badge.word}
              </span>
              <span className="text-[14px] font-semibold leading-snug text-ink">{s.headline}</span>
            </p>
            <div className="col-start-2">
              {s.details.map((d) => (
                <p key={d} className="text-[12px] leading-snug text-ink-soft" data-testid={s.first && d.startsWith(`It ${s.first} before it`) ? "which-first" : undefined}>
                  {d}
                </p>
              ))}
              <StabilityLine sentence={factors} />
            </div>
          </div>
        );
      })}
    </div>
  );
}
