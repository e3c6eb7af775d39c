"use client";
// The canvas: a react-konva stage with four layers — the drafting grid, the drawing (one node
// per element), the solve's results, and the interaction overlay (handles, snap, band, drafts).
// Pointer input goes to the controller in pointer.ts; this component only wires it up.
import { useCallback, useEffect, useMemo, useRef, useState, type DragEvent } from "react";
import { Group, Layer, Shape, Stage } from "react-konva";
import type Konva from "konva";
import { useStore } from "zustand";
import type { Vec2 } from "@/solver/types";
import { useAnalysis, useEditor, useStores } from "../context";
import { gridStep } from "../geometry/view";
import { fitScene, isFitted } from "../geometry/fit";
import { followFitRequests } from "../fitRequests";
import { GRID_MAJOR, GRID_MINOR } from "../render/palette";
import { markFrame } from "../perf";
import { BodyNode, CgNode, ItemNode, statesOf, useDrawingFamily } from "./nodes";
import { PointerOverlay, ResultsShape, SelectionHandles } from "./overlays";
import { createPointerController, type HitInfo, type PointerController } from "./pointer";
import { TRAY_MIME, type InteractionStore, type TrayDrop } from "./interaction";
import { resolveCanvasFont } from "./font";
import { CanvasLegend } from "./CanvasLegend";
import { UnderlayLayer } from "./UnderlayLayer";
import { drawAfterCommit, ignoreStagePointerInput } from "./immediate";
import { followLabelLayout } from "./labelLayout";

function Grid({ width, height }: { width: number; height: number }) {
  const view = useEditor((s) => s.view);
  return (
    <Shape
      listening={false}
      perfectDrawEnabled={false}
      sceneFunc={(kctx) => {
        const ctx = kctx._context;
        const step = gridStep(view.scale);
        const major = step * 5;
        const x0 = Math.floor(-view.x / view.scale / step) * step;
        const x1 = (width - view.x) / view.scale;
        const y0 = Math.floor((view.y - height) / view.scale / step) * step;
        const y1 = view.y / view.scale;
        const isMajor = (v: number) => Math.abs(v / major - Math.round(v / major)) < 1e-6;
        for (const pass of [false, true]) {
          ctx.beginPath();
          for (let x = x0; x <= x1; x += step) {
            if (isMajor(x) !== pass) continue;
            const sx = Math.round(view.x + x * view.scale) + 0.5;
            ctx.moveTo(sx, 0);
            ctx.lineTo(sx, height);
          }
          for (let y = y0; y <= y1; y += step) {
            if (isMajor(y) !== pass) continue;
            const sy = Math.round(view.y - y * view.scale) + 0.5;
            ctx.moveTo(0, sy);
            ctx.lineTo(width, sy);
          }
          ctx.strokeStyle = pass ? GRID_MAJOR : GRID_MINOR;
          ctx.lineWidth = 1;
          ctx.stroke();
        }
        // the world axes, faintly
        ctx.beginPath();
        ctx.moveTo(Math.round(view.x) + 0.5, 0);
        ctx.lineTo(Math.round(view.x) + 0.5, height);
        ctx.moveTo(0, Math.round(view.y) + 0.5);
        ctx.lineTo(width, Math.round(view.y) + 0.5);
        ctx.strokeStyle = "rgba(29,35,41,0.16)";
        ctx.stroke();
      }}
    />
  );
}

/** The elements of one layer: those not lifted (drawing layer), or only the lifted ones (interaction layer). */
function Elements({ interaction, lifted }: { interaction: InteractionStore; lifted: boolean }) {
  const sceneStore = useStores().scene;
  const up = useStore(interaction, (s) => s.lifted);
  const bodyIds = useStore(sceneStore, (s) => s.bodyIds ?? s.bodies.map((b) => b.id));
  const itemIds = useStore(sceneStore, (s) => s.itemIds ?? s.items.map((i) => i.id));
  // one subscription each here, not one per node
  const selection = useEditor((s) => s.selection);
  const scale = useEditor((s) => s.view.scale);
  const units = useEditor((s) => s.units);
  const states = useAnalysis((s) => statesOf(s.shown, s.shownSketch?.supports));
  const family = useDrawingFamily(units);
  const seeThrough = useEditor((s) => Boolean(s.sketch.underlay && !s.sketch.underlay.hidden));
  const shifts = useStore(interaction, (s) => s.labelShifts);
  const selected = useMemo(() => new Set(selection), [selection]);
  const bodies = useMemo(() => bodyIds.filter((id) => up.has(id) === lifted), [bodyIds, up, lifted]);
  const items = useMemo(() => itemIds.filter((id) => up.has(id) === lifted), [itemIds, up, lifted]);
  return (
    <>
      {bodies.map((id) => (
        <BodyNode key={id} id={id} selected={selected.has(id)} scale={scale} units={units} seeThrough={seeThrough} shift={shifts.get(id)} />
      ))}
      {items.map((id) => (
        <ItemNode key={id} id={id} selected={selected.has(id)} scale={scale} units={units} state={states.get(id)} shift={shifts.get(id)} family={family} />
      ))}
      {bodies.map((id) => (
        <CgNode key={`cg-${id}`} id={id} selected={selected.has(id)} scale={scale} units={units} />
      ))}
    </>
  );
}

export interface SketchCanvasProps {
  interaction: InteractionStore;
  /** receives the pointer controller (the editor's keyboard uses it for Escape and Enter) */
  onController?: (c: PointerController | null) => void;
}

export default function SketchCanvas({ interaction, onController }: SketchCanvasProps) {
  const stores = useStores();
  const containerRef = useRef<HTMLDivElement>(null);
  const stageRef = useRef<Konva.Stage | null>(null);
  const controllerRef = useRef<PointerController | null>(null);
  const stageCallbackRef = useCallback((stage: Konva.Stage | null) => {
    stageRef.current = stage;
    if (stage) ignoreStagePointerInput(stage);
  }, []);
  // the interaction layer is drawn as soon as a change is committed (see immediate.ts)
  const liftedLayerRef = useCallback((layer: Konva.Layer | null) => {
    if (layer) drawAfterCommit(layer);
  }, []);
  const [size, setSize] = useState<{ width: number; height: number } | null>(null);
  const view = useEditor((s) => s.view);
  const dragging = useStore(interaction, (s) => s.dragging);
  const panning = useStore(interaction, (s) => s.panning || s.spaceHeld);
  const tool = useEditor((s) => s.tool.kind);

  // size follows the container; the first size fits the sketch into view
  useEffect(() => {
    const el = containerRef.current;
    if (!el) return;
    let first = true;
    const measure = () => {
      const r = el.getBoundingClientRect();
      const next = { width: Math.max(1, Math.floor(r.width)), height: Math.max(1, Math.floor(r.height)) };
      setSize(next);
      const s = stores.editor.getState();
      const resized = s.viewport.width !== next.width || s.viewport.height !== next.height;
      s.setViewport(next);
      // a drawing still as its last fit left it (no zoom or pan since) stays fitted when the canvas
      // changes size (the results below grow, the window is resized); one the user moved stays put
      if (!first && resized && isFitted(s.view) && !interaction.getState().dragging) {
        const scene = stores.scene.getState();
        if (scene.bodies.length) s.setView(fitScene(scene, next.width, next.height, { result: stores.analysis.getState().shown, units: s.units }));
      }
      if (first) {
        first = false;
        const scene = stores.scene.getState();
        if (scene.bodies.length) s.setView(fitScene(scene, next.width, next.height, { result: stores.analysis.getState().shown, units: s.units }));
        else s.setView({ scale: 120, x: Math.round(next.width * 0.3), y: Math.round(next.height * 0.7) });
      }
    };
    measure();
    const ro = new ResizeObserver(measure);
    ro.observe(el);
    return () => ro.disconnect();
  }, [stores, interaction]);

  // a whole other sketch (an example, an import, or the one they replaced, back with undo) is fitted into view
  // (and, still as a fit left it, once more when the first result brings the reactions' arrows)
  useEffect(() => followFitRequests(stores, () => interaction.getState().dragging), [stores, interaction]);

  // the pointer controller and its native listeners (wheel must not be passive); all outside render
  useEffect(() => {
    const el = containerRef.current;
    if (!el) return;
    const controller = createPointerController({
      stores,
      interaction,
      container: () => containerRef.current,
      hitTest: (p: Vec2): HitInfo | null => {
        const stage = stageRef.current;
        if (!stage) return null;
        let node: Konva.Node | null = stage.getIntersection({ x: p[0], y: p[1] });
        while (node) {
          const hit = node.getAttr("hit") as HitInfo | undefined;
          if (hit) return hit;
          node = node.getParent();
        }
        return null;
      },
    });
    controllerRef.current = controller;
    onController?.(controller);
    const down = (e: PointerEvent) => {
      el.focus({ preventScroll: true });
      controller.down(e);
    };
    const move = (e: PointerEvent) => controller.hover(e);
    const leave = () => controller.leave();
    const wheel = (e: WheelEvent) => controller.wheel(e);
    const dbl = () => controller.finishPolygon();
    el.addEventListener("pointerdown", down);
    el.addEventListener("pointermove", move);
    el.addEventListener("pointerleave", leave);
    el.addEventListener("wheel", wheel, { passive: false });
    el.addEventListener("dblclick", dbl);
    return () => {
      el.removeEventListener("pointerdown", down);
      el.removeEventListener("pointermove", move);
      el.removeEventListener("pointerleave", leave);
      el.removeEventListener("wheel", wheel);
      el.removeEventListener("dblclick", dbl);
      onController?.(null);
      controllerRef.current = null;
      controller.dispose();
    };
  }, [stores, interaction, onController]);

  // crowded element names move off other texts: placed for the whole sketch, again after each
  // change, but not while a drag lasts (a drag stays one small redraw; names settle on release)
  useEffect(() => followLabelLayout(stores, interaction), [stores, interaction]);

  // redraw once the page font has loaded, so canvas text uses it
  useEffect(() => {
    resolveCanvasFont();
    let live = true;
    document.fonts?.ready.then(() => {
      if (!live) return;
      resolveCanvasFont();
      stageRef.current?.batchDraw();
    });
    return () => {
      live = false;
    };
  }, []);

  const onDrop = (e: DragEvent<HTMLDivElement>) => {
    const raw = e.dataTransfer.getData(TRAY_MIME);
    if (!raw) return;
    e.preventDefault();
    let what: TrayDrop;
    try {
      what = JSON.parse(raw) as TrayDrop;
    } catch {
      return;
    }
    containerRef.current?.focus({ preventScroll: true });
    controllerRef.current?.drop(what, e);
  };

  const cursor = panning ? "grab" : tool === "place" || tool === "body" || tool === "pick-point" || tool === "calibrate" ? "crosshair" : "default";

  return (
    <div
      ref={containerRef}
      className="relative h-full w-full overflow-hidden bg-paper-card outline-none focus-visible:ring-2 focus-visible:ring-accent/60 focus-visible:ring-inset"
      style={{ cursor, touchAction: "none" }}
      tabIndex={0}
      role="application"
      aria-label="Drawing of the free-body diagram"
      aria-describedby="canvas-summary canvas-alt canvas-help"
      data-testid="sketch-canvas"
      data-view={`${view.scale} ${view.x} ${view.y}`}
      onDragOver={(e) => {
        if (e.dataTransfer.types.includes(TRAY_MIME)) {
          e.preventDefault();
          e.dataTransfer.dropEffect = "copy";
        }
      }}
      onDrop={onDrop}
    >
      {size && (
        <Stage ref={stageCallbackRef} width={size.width} height={size.height}>
          <UnderlayLayer interaction={interaction} />
          <Layer listening={false}>
            <Grid width={size.width} height={size.height} />
          </Layer>
          <Layer listening={!dragging} onDraw={() => queueMicrotask(markFrame)}>
            <Group x={view.x} y={view.y}>
              <Elements interaction={interaction} lifted={false} />
            </Group>
          </Layer>
          <Layer listening={false}>
            <Group x={view.x} y={view.y}>
              <ResultsShape interaction={interaction} />
            </Group>
          </Layer>
          <Layer ref={liftedLayerRef} listening={!dragging} onDraw={() => queueMicrotask(markFrame)}>
            <Group x={view.x} y={view.y}>
              <Elements interaction={interaction} lifted />
              <SelectionHandles />
              <PointerOverlay interaction={interaction} />
            </Group>
          </Layer>
        </Stage>
      )}
      <CanvasLegend />
      {/* the pixels say nothing to a screen reader: the drawing in words is the editor's summary
          (`canvas-summary`: what is drawn and the result), the element list and the results */}
      <p id="canvas-alt" className="sr-only">
        Every element drawn here is listed under Elements, each a button that selects it for the Properties panel; the reactions found are in the Results panel.
      </p>
    </div>
  );
}
