// A small picture of an element kind, drawn with the canvas's own symbols (text left out).
import { memo, useMemo } from "react";
import type { ElementKind } from "@/canvas/model/elements";
import { itemPrims, bodyPrims } from "@/canvas/render/symbols";
import { primsBox, type Prim } from "@/canvas/render/prims";
import { primsToSvg } from "@/canvas/render/svg";
import type { SceneItem } from "@/canvas/scene";

const ANGLES: Partial<Record<ElementKind, number>> = { roller: 90, contact: 90, tie: -90, force: -90, distributed: -90, inlet: 0, outlet: 0 };

function iconPrims(kind: ElementKind, friction: boolean, polygon: boolean): Prim[] {
  if (kind === "body") {
    const outline: [number, number][] = polygon ? [[0, 0], [1, 0], [1, 0.45], [0.55, 0.8], [0, 0.8]] : [[0, 0], [1.2, 0], [1.2, 0.7], [0, 0.7]];
    return bodyPrims({ kind: "body", id: "", outline, cg: [0.6, 0.35], cgGiven: false, mass: 0 }, { units: "SI", scale: 26, showName: false });
  }
  const fake = {
    id: "",
    body: "",
    kind,
    at: [0, 0],
    angle: ANGLES[kind] ?? 0,
    magnitude: 1,
    value: 1,
    from: [0, 0],
    to: [1, 0],
    w1: 1,
    w2: 1,
    massFlow: 1,
    velocity: 1,
    pressure: 0,
    ...(friction ? { mu: 0.3 } : {}),
  } as unknown as SceneItem;
  return itemPrims(fake, { units: "SI", scale: 34, showName: false }).filter((p) => p.t !== "text");
}

export const SymbolIcon = memo(function SymbolIcon({ kind, friction = false, polygon = false, size = 30 }: { kind: ElementKind; friction?: boolean; polygon?: boolean; size?: number }) {
  const { svg, box } = useMemo(() => {
    const prims = iconPrims(kind, friction, polygon);
    return { svg: primsToSvg(prims), box: primsBox(prims) };
  }, [kind, friction, polygon]);
  const w = box.maxX - box.minX + 6;
  const h = box.maxY - box.minY + 6;
  const side = Math.max(w, h);
  const vb = `${box.minX - 3 - (side - w) / 2} ${box.minY - 3 - (side - h) / 2} ${side} ${side}`;
  return <svg width={size} height={size} viewBox={vb} className="drawn-in-ink" aria-hidden="true" focusable="false" dangerouslySetInnerHTML={{ __html: svg }} />;
});
