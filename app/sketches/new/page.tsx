import type { Metadata } from "next";
import { NewSketchClient } from "./NewSketchClient";

export const metadata: Metadata = { title: "New sketch" };

export default async function NewSketchPage({ searchParams }: { searchParams: Promise<{ example?: string }> }) {
  const { example } = await searchParams;
  return <NewSketchClient example={typeof example === "string" ? example : undefined} />;
}
