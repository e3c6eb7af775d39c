import type { Metadata } from "next";
import { SavedSketchClient } from "./SavedSketchClient";

export const metadata: Metadata = { title: "Sketch" };

export default async function SavedSketchPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  return <SavedSketchClient id={id} />;
}
