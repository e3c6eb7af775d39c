"use client";
// The underlay's own layer, below everything (the grid included): the uploaded drawing placed by
// its origin, scale and turn. It takes the pointer only while it can be moved (shown, unlocked,
// editable, the select tool); the marks of a calibration in progress are drawn above it.
import { useEffect, useState } from "react";
import { Circle, Group, Image as KonvaImage, Layer, Line, Rect, Text } from "react-konva";
import { useStore } from "zustand";
import type { Vec2 } from "@/solver/types";
import { imageToWorld } from "@/solver/underlay";
import type { UnderlayFile } from "@/solver/schema";
import { useEditor } from "../context";
import { toScreen, type View } from "../geometry/view";
import { underlayOnScreen } from "../geometry/underlay";
import { ACCENT, INK_FAINT, PAPER_CARD } from "../render/palette";
import { canvasFont } from "./font";
import type { InteractionStore } from "./interaction";
import { fetchUnderlayFile, underlayFrameNote, underlayRetryMs, type UnderlayFailure } from "./underlayStatus";

/** Where an underlay's file is fetched from (the route checks the reader's role). */
export const underlayUrl = (uploadId: string) => `/api/uploads/${encodeURIComponent(uploadId)}`;

type Loaded = { src: string; img: HTMLImageElement | null; failed: boolean; reason?: UnderlayFailure };

/**
 * The drawing's image: fetched (so a failure has its status and the server's words), drawn from
 * the bytes, and fetched again after a failure that may pass (the file store down, the app out of
 * reach), so the drawing comes back on its own once it can.
 */
function useImage(src: string | null): Loaded | null {
  const [state, setState] = useState<Loaded | null>(null);
  const [attempt, setAttempt] = useState(0);
  useEffect(() => {
    if (!src) return;
    let live = true;
    let url: string | null = null;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const fail = (reason: UnderlayFailure) => {
      if (!live) return;
      setState({ src, img: null, failed: true, reason });
      const wait = underlayRetryMs(reason);
      if (wait) timer = setTimeout(() => live && setAttempt((n) => n + 1), wait);
    };
    void fetchUnderlayFile(src).then((got) => {
      if (!live) return;
      if (!got.ok) return fail(got.failure);
      url = URL.createObjectURL(got.blob);
      const img = new window.Image();
      img.onload = () => live && setState({ src, img, failed: false });
      img.onerror = () => fail({ status: 200 });
      img.src = url;
    });
    return () => {
      live = false;
      clearTimeout(timer);
      // the image keeps its decoded pixels; the bytes' address is no longer needed once it is replaced
      if (url) {
        const gone = url;
        setTimeout(() => URL.revokeObjectURL(gone), 0);
      }
    };
  }, [src, attempt]);
  return state && state.src === src ? state : null;
}

function Mark({ at, n, view, u }: { at: Vec2; n: number; view: View; u: UnderlayFile }) {
  const [x, y] = toScreen(view, imageToWorld({ origin: u.origin, metresPerPixel: u.metresPerPixel, rotation: u.rotation ?? 0 }, at));
  return (
    <Group x={x} y={y}>
      <Circle radius={7} stroke={ACCENT} strokeWidth={1.6} />
      <Line points={[-12, 0, -3, 0, 3, 0, 12, 0]} stroke={ACCENT} strokeWidth={1.2} />
      <Line points={[0, -12, 0, -3, 0, 3, 0, 12]} stroke={ACCENT} strokeWidth={1.2} />
      <Rect x={9} y={-22} width={16} height={14} fill={PAPER_CARD} cornerRadius={2} />
      <Text x={9} y={-20} width={16} align="center" text={String(n)} fontSize={11} fontStyle="bold" fill={ACCENT} fontFamily={canvasFont()} />
    </Group>
  );
}

export function UnderlayLayer({ interaction }: { interaction: InteractionStore }) {
  const u = useEditor((s) => s.sketch.underlay);
  const view = useEditor((s) => s.view);
  const tool = useEditor((s) => s.tool);
  const readOnly = useEditor((s) => s.readOnly);
  const dragging = useStore(interaction, (s) => s.dragging);
  const hover = useStore(interaction, (s) => (tool.kind === "calibrate" ? s.hover : null));
  const loaded = useImage(u ? underlayUrl(u.upload) : null);
  if (!u) return null;
  const place = underlayOnScreen(u, view);
  // while the file loads (or when it cannot), its frame and a word stand where it will lie
  const note = underlayFrameNote(loaded, Boolean(u.hidden));
  const movable = !u.hidden && !u.locked && !readOnly && tool.kind === "select" && !dragging;
  const marks = tool.kind === "calibrate" ? tool.points : [];
  const hoverScreen = hover ? toScreen(view, hover) : null;
  const lastMark = marks.length === 1 ? toScreen(view, imageToWorld({ origin: u.origin, metresPerPixel: u.metresPerPixel, rotation: u.rotation ?? 0 }, marks[0])) : null;
  return (
    <Layer listening={movable}>
      {!u.hidden && loaded?.img ? (
        <KonvaImage image={loaded.img} {...place} opacity={u.opacity ?? 0.6} hit={{ type: "underlay" }} perfectDrawEnabled={false} />
      ) : null}
      {note ? (
        <Group x={place.x} y={place.y} rotation={place.rotation} listening={false}>
          <Rect width={place.width} height={place.height} stroke={INK_FAINT} dash={[6, 4]} strokeWidth={1} />
          <Text x={8} y={8} width={Math.max(120, place.width - 16)} text={note} fontSize={11.5} fill={INK_FAINT} fontFamily={canvasFont()} />
        </Group>
      ) : null}
      {marks.length ? (
        <Group listening={false}>
          {lastMark && hoverScreen ? <Line points={[...lastMark, ...hoverScreen]} stroke={ACCENT} strokeWidth={1.2} dash={[6, 4]} /> : null}
          {marks.length === 2 ? (
            <Line
              points={marks.flatMap((m) => toScreen(view, imageToWorld({ origin: u.origin, metresPerPixel: u.metresPerPixel, rotation: u.rotation ?? 0 }, m)))}
              stroke={ACCENT}
              strokeWidth={1.4}
              dash={[6, 4]}
            />
          ) : null}
          {marks.map((m, i) => (
            <Mark key={i} at={m} n={i + 1} view={view} u={u} />
          ))}
        </Group>
      ) : null}
    </Layer>
  );
}
