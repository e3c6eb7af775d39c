import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getSketchAccess } from "@/db/queries/sketches";
import { isUuid } from "@/lib/schemas";
import { currentSession } from "@/lib/session";
import { SavedSketchClient } from "./SavedSketchClient";

export const metadata: Metadata = { title: "Sketch" };

export default async function SavedSketchPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  // A signed-in reader asking for a sketch that is not there for them gets a 404 (the editor loads
  // on the client, so without this the page would answer 200 and say so only afterwards). A
  // signed-out reader is asked to sign in by the editor itself, and comes back here.
  const session = await currentSession();
  if (session && !(isUuid(id) && (await getSketchAccess(id, session.user.id))?.role)) notFound();
  return <SavedSketchClient id={id} />;
}
