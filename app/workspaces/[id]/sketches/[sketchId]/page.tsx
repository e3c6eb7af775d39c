import type { Metadata } from "next";
import { SketchScreen } from "@/components/sketches/SketchScreen";
import { loadSketchPage } from "@/lib/sketch-page";

export const metadata: Metadata = { title: "Sketch" };

export default async function SketchPage({ params }: { params: Promise<{ id: string; sketchId: string }> }) {
  const { id, sketchId } = await params;
  const { data } = await loadSketchPage(id, sketchId, `/workspaces/${id}/sketches/${sketchId}`);
  return <SketchScreen initial={data} />;
}
