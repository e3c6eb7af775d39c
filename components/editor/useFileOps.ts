"use client";
// File work for the editor: import (a bad file changes nothing), export JSON, SVG and PNG.
import { useCallback, useState, type RefObject } from "react";
import type { EditorStores } from "@/canvas/context";
import { download, exportSketchText, fileStem, importSketchText, svgToPng } from "@/canvas/files";
import { renderSketchSvg } from "@/canvas/render/svg";
import { statusSentences } from "@/components/results/statusSentence";
import { CAUTION_SHORT } from "@/solver/cautions";
import { resultScale, unitFamily } from "@/solver/report";
import { replaceSketch } from "@/canvas/commands/fields";
import type { Command } from "@/canvas/commands/define";
import type { FieldError } from "@/solver/types";

export interface ImportProblem {
  file: string;
  errors: FieldError[];
}

export function useFileOps(stores: EditorStores, inputRef: RefObject<HTMLInputElement | null>) {
  const [problem, setProblem] = useState<ImportProblem | null>(null);

  const importText = useCallback(
    (text: string, name: string) => {
      const out = importSketchText(text);
      if (!out.ok) {
        setProblem({ file: name, errors: out.errors });
        return false;
      }
      const s = stores.editor.getState();
      if (!s.apply(replaceSketch({ sketch: out.sketch, label: `Import ${name}` }) as Command<unknown>)) return false;
      // replaceSketch asks the canvas to fit the view to the imported drawing
      s.notify(out.migratedFrom.length ? `Opened ${name} (format version ${out.migratedFrom[0]}, brought up to date).` : `Opened ${name}.`);
      return true;
    },
    [stores],
  );

  const onFile = useCallback(
    async (file: File | undefined) => {
      if (!file) return;
      if (file.size > 1_000_000) {
        setProblem({ file: file.name, errors: [{ path: "", message: "The file is larger than 1 MB; a sketch file is much smaller than that." }] });
        return;
      }
      importText(await file.text(), file.name);
      if (inputRef.current) inputRef.current.value = "";
    },
    [importText, inputRef],
  );

  // an exported drawing stands on its own in a report: its title, what the result says, the
  // units and the date above it, the caution under it
  const svgNow = useCallback(() => {
    const s = stores.editor.getState();
    const a = stores.analysis.getState();
    // the results panel's one unit family, for the words and the figures drawn
    const family = a.shown ? unitFamily(s.units, resultScale(a.shown, a.shownStability)) : undefined;
    const said = a.shown && a.shownSketch ? statusSentences(a.shownSketch, a.shown, s.units, family?.force, a.shownStability ?? undefined).map((x) => x.headline) : [];
    const lines = [
      ...(a.stale ? ["Results are from before the last change: the sketch has an input error."] : []),
      ...(said.length ? said : ["Not solved."]),
      `${s.units === "SI" ? "SI units" : "US customary units"} · drawn ${new Date().toISOString().slice(0, 10)} with Counterpoise`,
    ];
    return renderSketchSvg(s.sketch, a.shown, {
      units: s.units,
      width: 1400,
      height: 900,
      stale: a.stale,
      family,
      heading: { title: s.sketch.title || "Untitled sketch", lines },
      note: `Caution: ${CAUTION_SHORT}`,
    });
  }, [stores]);

  const stem = () => fileStem(stores.editor.getState().sketch.title);

  return {
    problem,
    clearProblem: () => setProblem(null),
    onFile,
    importText,
    openImport: () => inputRef.current?.click(),
    exportJson: () => download(new Blob([exportSketchText(stores.editor.getState().sketch)], { type: "application/json" }), `${stem()}.counterpoise.json`),
    exportSvg: () => download(new Blob([svgNow()], { type: "image/svg+xml" }), `${stem()}.svg`),
    exportPng: async () => {
      try {
        download(await svgToPng(svgNow(), 1400, 900, 2), `${stem()}.png`);
      } catch (err) {
        stores.editor.getState().notify(`The PNG could not be made: ${(err as Error).message}`);
      }
    },
  };
}
