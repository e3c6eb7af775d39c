"use client";
// "Cases": operating cases (parameter changes, group factors, flow), combinations (cases added
// with factors, solved as one factored load set), the required factors of safety, and the results
// of all of them at once: reactions per case with the governing case, the envelope with each
// support's design load, and the factors of safety against overturning and sliding.
import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState } from "react";
import { asDrawnStudy, caseInputErrors, caseWarnings, loadGroupsOf, NO_UNIT, type StudyResult } from "@/solver/cases";
import { asDrawnTwin } from "@/solver/report";
import { errorPlace, messageInWords } from "@/components/results/errorPlace";
import type { CaseFile, CombinationFile, SketchFile } from "@/solver/schema";
import type { Command } from "@/canvas/commands/define";
import { caseRemovalEffects, removeCase, removeCombination, setStudy } from "@/canvas/commands/studies";
import { useEditor, useStores } from "@/canvas/context";
import { CancelledError, StudyRunner } from "@/canvas/studies/client";
import { BUTTON, HEADING, INPUT, PRIMARY_BUTTON } from "@/components/editor/ui";
import { combinationWarningWords, formatFactors, formatOverrides, formatTerms, idFromName, parseFactors, parseOverrides, parseTerms, type Parsed } from "./casesText";
import { asDrawnName, CaseTables } from "./CaseTables";
import { SideScroll } from "./ReportTable";
import { studyErrorWords } from "./studyError";
import { FLOW_FACTOR_PRESSURES } from "@/solver/cautions";

/** Each field's refusal, by its label: reported up so the run waits until they are put right. */
const FieldErrors = createContext<(label: string, error: string | null) => void>(() => {});

/** A text field that commits a parsed value on blur or Enter and shows its error at the field.
 *  The text is parsed once a commit: `onCommit` gets what `parse` made of it. */
function TextCell<T>({ label, value, parse, onCommit, placeholder, width, multiline }: {
  label: string;
  value: string;
  parse: (t: string) => Parsed<T>;
  onCommit: (value: T) => void;
  placeholder?: string;
  width?: string;
  /** a name: the field wraps onto as many lines as the text needs, so the whole of it shows (Enter still commits) */
  multiline?: boolean;
}) {
  const [text, setText] = useState(value);
  const [error, setError] = useState<string | null>(null);
  // follow the document when it changes underneath (undo, another field)
  const [shown, setShown] = useState(value);
  if (shown !== value) {
    setShown(value);
    setText(value);
    setError(null);
  }
  // the panel does not run while a field holds text it refused
  const report = useContext(FieldErrors);
  useEffect(() => {
    report(label, error);
    return () => report(label, null);
  }, [report, label, error]);
  const commit = () => {
    const r = parse(text);
    if (!r.ok) return setError(r.error);
    setError(null);
    if (text !== value) onCommit(r.value);
  };
  // a wrapping field grows to its text (field-sizing where the browser has it, its scroll height otherwise)
  const area = useRef<HTMLTextAreaElement>(null);
  useEffect(() => {
    const el = area.current;
    if (!el || (typeof CSS !== "undefined" && CSS.supports?.("field-sizing", "content"))) return;
    el.style.height = "auto";
    if (el.scrollHeight > 0) el.style.height = `${el.scrollHeight + 2}px`;
  }, [text]);
  return (
    <label className={`flex flex-col ${width ?? ""}`}>
      <span className="sr-only">{label}</span>
      {multiline ? (
        <textarea
          ref={area}
          rows={1}
          className={`${INPUT} !h-auto min-h-7 resize-none overflow-hidden py-[3px] leading-snug [field-sizing:content]`}
          value={text}
          placeholder={placeholder}
          aria-label={label}
          aria-invalid={error ? true : undefined}
          // one line of words: a line break typed or pasted is a space
          onChange={(e) => setText(e.target.value.replace(/\s*\n\s*/g, " "))}
          onBlur={commit}
          onKeyDown={(e) => {
            if (e.key !== "Enter") return;
            e.preventDefault();
            commit();
          }}
        />
      ) : (
      <input
        className={INPUT}
        value={text}
        placeholder={placeholder}
        // the whole text on hover, where a long one runs past the field's edge
        title={text.length > 12 ? text : undefined}
        aria-label={label}
        aria-invalid={error ? true : undefined}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={(e) => e.key === "Enter" && commit()}
      />
      )}
      {error && <span className="mt-0.5 text-[11px] text-caution" role="alert">{error}</span>}
    </label>
  );
}

const parseName = (t: string): Parsed<string> => (t.trim() ? { ok: true, value: t.trim().replace(/\s+/g, " ") } : { ok: false, error: "needs a name" });

export function CasesPanel() {
  const { editor } = useStores();
  const sketch = useEditor((s) => s.sketch);
  const units = useEditor((s) => s.units);
  const cases = useMemo(() => sketch.cases ?? [], [sketch.cases]);
  const combinations = sketch.combinations ?? [];
  const parameters = Object.keys(sketch.parameters ?? {});
  // an example from this sketch's own parameters ("v = 30 m/s"), not a name it may not have
  const changePlaceholder = parameters.length ? `${parameters[0]} = ${String(sketch.parameters![parameters[0]])}` : "no parameters in this sketch";
  const runner = useRef<StudyRunner | null>(null);
  const [study, setStudyResult] = useState<{ result: StudyResult; of: typeof sketch } | null>(null);
  const [running, setRunning] = useState<(() => void) | null>(null);
  const [progress, setProgress] = useState<{ done: number; total: number; noun: string } | null>(null);
  const [error, setError] = useState<string | null>(null);
  const groups = useMemo(() => loadGroupsOf(sketch), [sketch]);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const reportError = useCallback((label: string, message: string | null) => {
    setFieldErrors((prev) => {
      if ((prev[label] ?? null) === message) return prev;
      const next = { ...prev };
      if (message) next[label] = message;
      else delete next[label];
      return next;
    });
  }, []);
  const refused = Object.keys(fieldErrors);
  useEffect(() => {
    runner.current = new StudyRunner();
    return () => runner.current?.dispose();
  }, []);

  // removing a case takes its terms in combinations and the kept sweeps on it along, said here
  // (shown while the studies are as the removal left them: an undo or another edit ends it)
  const [removed, setRemoved] = useState<{ note: string; after: SketchFile } | null>(null);
  const setRemovedNote = (note: string | null) => setRemoved(note ? { note, after: editor.getState().sketch } : null);
  const removedNote = removed && removed.after.cases === sketch.cases && removed.after.combinations === sketch.combinations && removed.after.sweeps === sketch.sweeps ? removed.note : null;
  const comboName = (id: string) => combinations.find((k) => k.id === id)?.name ?? id;
  const dropCase = (c: CaseFile) => {
    const fx = caseRemovalEffects(sketch, c.id);
    const also = [
      ...fx.combinationsChanged.map((id) => `its term in ${comboName(id)}`),
      ...fx.combinationsRemoved.map((id) => `the combination ${comboName(id)} (it had no other case)`),
      ...(fx.sweepsRemoved.length ? [`${fx.sweepsRemoved.length === 1 ? "a kept sweep" : `${fx.sweepsRemoved.length} kept sweeps`} run on it`] : []),
    ];
    if (!editor.getState().apply(removeCase({ id: c.id }) as Command<unknown>)) return;
    setRemovedNote(also.length ? `Removed case ${c.name}, and with it ${also.join(", ")}. Undo brings them back.` : null);
  };
  const dropCombination = (k: CombinationFile) => {
    const sweeps = (sketch.sweeps ?? []).filter((s) => s.combination === k.id).length;
    if (!editor.getState().apply(removeCombination({ id: k.id }) as Command<unknown>)) return;
    setRemovedNote(sweeps ? `Removed combination ${k.name}, and with it ${sweeps === 1 ? "the kept sweep" : `${sweeps} kept sweeps`} run on it. Undo brings ${sweeps === 1 ? "it" : "them"} back.` : null);
  };
  const putCases = (next: CaseFile[]) => editor.getState().apply(setStudy({ key: "cases", value: next }) as Command<unknown>);
  const putCombos = (next: CombinationFile[]) => editor.getState().apply(setStudy({ key: "combinations", value: next }) as Command<unknown>);
  const updateCase = (i: number, patch: Partial<CaseFile>) => putCases(cases.map((c, k) => (k === i ? { ...c, ...patch } : c)));
  const takenIds = [...cases.map((c) => c.id), ...combinations.map((c) => c.id)];
  // a value the sketch cannot read with (38 psi for a speed) is refused here, naming what it breaks,
  // rather than leaving the case unsolved and the envelope without it
  const parseCaseParameters = (t: string, c: CaseFile): Parsed<Record<string, string> | undefined> => {
    const r = parseOverrides(t, parameters);
    if (!r.ok || !r.value) return r;
    const broken = caseInputErrors(sketch, { ...c, parameters: r.value })[0];
    if (!broken) return r;
    const param = /parameters\.([A-Za-z_]\w*)$/.exec(broken.path)?.[1];
    const where = param ? `${param} = ${r.value[param] ?? ""}` : `${formatOverrides(r.value)} breaks ${errorPlace(sketch, broken.path)}`;
    // "v = 30 has no unit; …" and "v = 30 psi is a pressure, …" read on from the change; any other
    // message after a colon, in the form's words
    const message = messageInWords(sketch, broken.path, broken.message);
    const readsOn = param && (broken.message.startsWith(NO_UNIT) || /^is an? /.test(broken.message));
    return { ok: false, error: readsOn ? `${where} ${message}` : `${where}: ${message}` };
  };

  const addCase = () => {
    const name = cases.length ? `Case ${cases.length + 1}` : "Normal operation";
    putCases([...cases, { id: idFromName(name, takenIds), name }]);
  };
  const addCombination = () => {
    if (!cases.length) return;
    const name = `Combination ${combinations.length + 1}`;
    putCombos([...combinations, { id: idFromName(name, takenIds), name, terms: cases.slice(0, 1).map((c) => ({ case: c.id, factor: 1 })) }]); // one case to start from: two would count the loads they share twice
  };

  const run = () => {
    if (!runner.current) return;
    setError(null);
    // the sketch as drawn is one run when there are no cases (solveCases)
    const total = Math.max(cases.length, 1) + combinations.length;
    const noun = combinations.length ? "cases and combinations" : total === 1 ? "case" : "cases";
    setProgress({ done: 0, total, noun });
    const job = runner.current.run({ kind: "cases", text: JSON.stringify(sketch) }, (done, total) => setProgress({ done, total, noun }));
    setRunning(() => job.cancel);
    const of = sketch;
    job.promise
      .then((result) => setStudyResult({ result, of }))
      .catch((err) => setError(err instanceof CancelledError ? "Stopped." : studyErrorWords(of, err)))
      .finally(() => {
        setRunning(null);
        setProgress(null);
      });
  };

  const staleResult = study && study.of !== sketch;
  // the case whose run is the sketch as drawn over again (no changes, or changes that restate the
  // drawing's values): its results are the ones the status above already gives, so it is named
  // "<case>, as drawn" and said once, as on a version's page and the calc sheet
  const twin = useMemo(() => (study?.of.cases?.length ? asDrawnTwin(study.result, asDrawnStudy(study.of)) : null), [study]);

  return (
    <FieldErrors.Provider value={reportError}>
    <div className="@container" data-testid="cases-panel">
    <div className="grid min-h-0 gap-4 @5xl:grid-cols-[minmax(22rem,1fr)_minmax(24rem,1.4fr)]">
      <div className="min-w-0 space-y-3">
        <section aria-labelledby="cases-h">
          <div className="flex items-center gap-2">
            <h3 id="cases-h" className={HEADING}>Operating cases</h3>
            <button type="button" className={`${BUTTON} ml-auto h-6 text-[11.5px]`} onClick={addCase}>
              Add a case
            </button>
          </div>
          {cases.length === 0 ? (
            <p className="mt-1 text-[12px] text-ink-faint">
              No cases yet: the sketch is solved as drawn. A case changes parameters (“Q = 1500 gpm”), scales load groups (“dead 1.2, flow 1.5”; weights are in
              “dead”, loads in “loads”, ports in “flow” unless given a group) or the flow (× f: momentum flux × f²; port gauge pressures stay as entered).
            </p>
          ) : (
            // the columns share the panel's width down to a width each field still reads at; on a
            // narrower panel (a phone) the table scrolls sideways inside it, every field reachable
            <SideScroll>
            <table className="mt-1 w-full min-w-[40rem] table-fixed text-[12px]" data-testid="cases-table">
              <colgroup>
                <col className="w-[36%]" />
                <col className="w-[31%]" />
                <col className="w-[22%]" />
                <col className="w-14" />
                <col className="w-6" />
              </colgroup>
              <thead>
                <tr className="text-left text-[11px] text-ink-faint">
                  <th className="font-medium">Name</th>
                  <th className="font-medium">Parameter changes</th>
                  <th className="font-medium">Group factors</th>
                  <th className="font-medium">Flow ×</th>
                  <th />
                </tr>
              </thead>
              <tbody>
                {cases.map((c, i) => (
                  <tr key={c.id} className="align-top" data-case={c.id}>
                    <td className="pr-1 pb-1">
                      <TextCell label={`Name of case ${c.id}`} value={c.name} parse={parseName} onCommit={(name) => updateCase(i, { name })} multiline />
                      {/* one line in every row: the id gives way (cut short, whole in its title), never the box */}
                      <span className="flex items-center gap-x-2 whitespace-nowrap text-[10.5px] text-ink-faint" data-testid="case-id-line">
                        <span className="min-w-0 truncate" title={`id ${c.id}`}>id {c.id}</span>
                        <label className="ml-auto flex shrink-0 items-center gap-1" title="A load case: solved only as part of the combinations that name it, not on its own (left out of the case table, the envelope and the findings)">
                          <input type="checkbox" className="h-3 w-3" checked={!!c.onlyInCombinations} onChange={(e) => updateCase(i, { onlyInCombinations: e.target.checked || undefined })} aria-label={`${c.name}: only in combinations`} />
                          only in combinations
                        </label>
                      </span>
                    </td>
                    <td className="pr-1 pb-1">
                      <TextCell label={`Parameter changes of ${c.name}`} value={formatOverrides(c.parameters)} placeholder={changePlaceholder} parse={(t) => parseCaseParameters(t, c)} onCommit={(parameters) => updateCase(i, { parameters })} />
                    </td>
                    <td className="pr-1 pb-1">
                      <TextCell label={`Group factors of ${c.name}`} value={formatFactors(c.factors)} placeholder="dead 1.2, flow 1.5" parse={(t) => parseFactors(t, groups)} onCommit={(factors) => updateCase(i, { factors })} />
                    </td>
                    <td className="pr-1 pb-1">
                      <TextCell label={`Flow factor of ${c.name}`} value={c.flowFactor === undefined ? "" : String(c.flowFactor)} placeholder="1" parse={(t) => (!t.trim() ? { ok: true, value: undefined } : Number(t) >= 0 ? { ok: true, value: Number(t) } : { ok: false, error: "a number, 0 or more" })} onCommit={(flowFactor) => updateCase(i, { flowFactor })} />
                    </td>
                    <td className="pb-1">
                      <button type="button" className="px-1 text-ink-faint hover:text-accent" aria-label={`Remove case ${c.name}`} onClick={() => dropCase(c)}>
                        ×
                      </button>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
            </SideScroll>
          )}
          {cases.some((c) => c.flowFactor !== undefined && c.flowFactor !== 1) && sketch.ports.some((p) => p.pressure !== undefined && Number(p.pressure) !== 0) && (
            <p className="mt-1 text-[11.5px] text-ink-soft" data-testid="flow-factor-pressures">
              {FLOW_FACTOR_PRESSURES}
            </p>
          )}
          {removedNote && (
            <p className="mt-1 text-[11.5px] text-ink-soft" role="status" data-testid="removed-note">
              {removedNote}
            </p>
          )}
          {cases.flatMap((c) => caseWarnings(sketch, c, groups)).map((w) => (
            <p key={w} className="mt-1 text-[11.5px] text-caution" data-testid="case-warning">
              <span aria-hidden="true">⚠ </span>
              {w}
            </p>
          ))}
        </section>

        <section aria-labelledby="combos-h">
          <div className="flex items-center gap-2">
            <h3 id="combos-h" className={HEADING}>Combinations</h3>
            <button type="button" className={`${BUTTON} ml-auto h-6 text-[11.5px]`} onClick={addCombination} disabled={!cases.length}>
              Add a combination
            </button>
          </div>
          {combinations.length === 0 ? (
            <p className="mt-1 text-[12px] text-ink-faint">
              A combination adds cases with factors and is solved as one factored load set, never by adding results. Each case carries its whole load set, so give each
              case of a combination its own load groups: a case “dead” with “loads 0, flow 0” and a case “flow” with “dead 0, loads 0” make “1.2 dead + 1.5 flow”.
            </p>
          ) : (
            <ul className="mt-1 space-y-1">
              {combinations.map((k, i) => (
                // the name and the terms side by side, the name given a share of the width (a
                // combination's name is often a sentence); on a narrow panel the terms go under it
                <li key={k.id} className="grid grid-cols-[minmax(0,1fr)_auto] items-start gap-1 @lg:grid-cols-[minmax(10rem,2fr)_minmax(12rem,3fr)_auto]" data-combination={k.id}>
                  <TextCell width="col-start-1 row-start-1" multiline label={`Name of combination ${k.id}`} value={k.name} parse={parseName} onCommit={(name) => putCombos(combinations.map((x, j) => (j === i ? { ...x, name } : x)))} />
                  <TextCell width="col-span-2 row-start-2 @lg:col-span-1 @lg:col-start-2 @lg:row-start-1" label={`Cases and factors of ${k.name}`} value={formatTerms(k.terms, cases)} placeholder="1.2 dead + 1.5 flow" parse={(t) => parseTerms(t, cases)} onCommit={(terms) => putCombos(combinations.map((x, j) => (j === i ? { ...x, terms } : x)))} />
                  <button type="button" className="col-start-2 row-start-1 px-1 pt-1 text-ink-faint hover:text-accent @lg:col-start-3" aria-label={`Remove combination ${k.name}`} onClick={() => dropCombination(k)}>
                    ×
                  </button>
                  <div className="col-span-full flex flex-wrap items-center gap-x-2 gap-y-0.5 text-[11px] text-ink-faint">
                    <span>Its own required factors of safety:</span>
                    {(["overturning", "sliding"] as const).map((key) => (
                      <span key={key} className="flex items-center gap-1">
                        {key}
                        <span className="w-14">
                          <TextCell
                            label={`Required factor against ${key} in ${k.name}`}
                            value={k.stability?.[key] === undefined ? "" : String(k.stability[key])}
                            placeholder={String(sketch.stability?.[key] ?? 1.5)}
                            parse={(t) => (!t.trim() ? { ok: true, value: undefined } : Number(t) > 0 ? { ok: true, value: Number(t) } : { ok: false, error: "more than 0, or blank" })}
                            onCommit={(v) =>
                              putCombos(
                                combinations.map((x, j) => {
                                  if (j !== i) return x;
                                  const stability = { ...x.stability, [key]: v };
                                  if (v === undefined) delete stability[key];
                                  const { stability: _, ...rest } = x;
                                  return Object.keys(stability).length ? { ...rest, stability } : rest;
                                }),
                              )
                            }
                          />
                        </span>
                      </span>
                    ))}
                    <span>(blank: the sketch&apos;s; a factored set is usually checked against 1.0)</span>
                  </div>
                  {combinationWarningWords(sketch, k).map((w) => (
                    <p key={w} className="col-span-full text-[11.5px] font-medium text-caution" role="note">
                      ⚠ {w}
                    </p>
                  ))}
                </li>
              ))}
            </ul>
          )}
        </section>

        <section aria-labelledby="req-h" className="flex flex-wrap items-end gap-3">
          <h3 id="req-h" className={`${HEADING} w-full`}>Required factors of safety</h3>
          {(["overturning", "sliding"] as const).map((k) => (
            <label key={k} className="flex items-center gap-1.5 text-[12px] text-ink-soft">
              against {k}
              <span className="w-16">
                <TextCell label={`Required factor against ${k}`} value={String(sketch.stability?.[k] ?? 1.5)} parse={(t) => (Number(t) > 0 ? { ok: true, value: Number(t) } : { ok: false, error: "more than 0" })} onCommit={(v) => editor.getState().apply(setStudy({ key: "stability", value: { ...sketch.stability, [k]: v } }) as Command<unknown>)} />
              </span>
            </label>
          ))}
          <span className="text-[11px] text-ink-faint">For every case, and each combination that sets none of its own. 1.5 each is common practice; your code or client may ask for other values.</span>
        </section>

        <div className="flex items-center gap-2">
          <button type="button" className={PRIMARY_BUTTON} onClick={run} disabled={!!running || refused.length > 0} aria-describedby={refused.length ? "cases-refused" : undefined}>
            {cases.length || combinations.length ? "Run all cases" : "Run as drawn"}
          </button>
          {refused.length > 0 && (
            <span id="cases-refused" className="text-[12px] text-caution" data-testid="cases-refused">
              Put right {refused.length === 1 ? "the field" : `the ${refused.length} fields`} marked in error first ({refused.join("; ")}): the run would leave {refused.length === 1 ? "it" : "them"} out.
            </span>
          )}
          {running && progress && (
            <>
              <progress className="h-2 w-20" max={progress.total} value={progress.done} aria-label="Cases progress" />
              <span className="text-[12px] text-ink-faint" role="status">
                {progress.done} of {progress.total} {progress.noun}
              </span>
              <button type="button" className={BUTTON} onClick={() => running()}>
                Stop
              </button>
            </>
          )}
          {error && <span className="text-[12px] text-caution" role="alert">{error}</span>}
        </div>
      </div>

      <div className="min-w-0 space-y-3" aria-live="polite">
        {!study ? (
          <p className="text-[12.5px] text-ink-faint">Run the cases to see the reactions per case, the governing case of each support, the envelope and the factors of safety.</p>
        ) : (
          <div className={staleResult ? "opacity-60" : ""} data-testid="case-results">
            {staleResult && <p className="mb-1 text-[12px] font-medium text-caution">The sketch changed since this run: run the cases again.</p>}
            {twin && (
              <p className="mb-1 text-[12px] text-ink-soft" data-testid="as-drawn-twin">
                {asDrawnName(study.result.runs.find((r) => r.id === twin)?.name ?? twin)}: this case is the sketch as drawn, so its reactions and factors are the ones the status above gives.
              </p>
            )}
            <CaseTables result={study.result} units={units} asDrawn={twin} sketch={study.of} />
          </div>
        )}
      </div>
    </div>
    </div>
    </FieldErrors.Provider>
  );
}
