"use client";
// Rename a sketch, describe it and tag it (editors and owners).
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import { Button, Field, Notice } from "@/components/shell/controls";
import { apiFetch, apiKey, ApiError } from "@/lib/api-client";
import { sketchTitleSchema, tagsSchema } from "@/lib/sketch-schemas";

export function SketchDetailsForm({
  sketchId,
  title,
  description,
  tags,
  onDone,
}: {
  sketchId: string;
  title: string;
  description: string;
  tags: string[];
  onDone: () => void;
}) {
  const qc = useQueryClient();
  const [form, setForm] = useState({ title, description, tags: tags.join(", ") });
  // opened from "Edit details": the keyboard goes to the first field
  useEffect(() => {
    document.getElementById("sketch-title")?.focus();
  }, []);
  const [local, setLocal] = useState<Record<string, string>>({});
  const save = useMutation({
    mutationFn: (body: { title: string; description: string; tags: string[] }) => apiFetch(`/api/sketches/${sketchId}`, { method: "PATCH", body }),
    onSuccess: async () => {
      await qc.invalidateQueries({ queryKey: apiKey(`/api/sketches/${sketchId}`) });
      onDone();
    },
  });
  const err = save.error instanceof ApiError ? save.error : null;
  const fieldError = (name: string) => local[name] ?? err?.fields.find((f) => f.path === name || f.path.startsWith(`${name}.`))?.message;

  return (
    <form
      className="space-y-3"
      aria-label="Sketch details"
      onSubmit={(e) => {
        e.preventDefault();
        const t = sketchTitleSchema.safeParse(form.title);
        const tg = tagsSchema.safeParse(form.tags.split(",").map((x) => x.trim()).filter(Boolean));
        const problems: Record<string, string> = {};
        if (!t.success) problems.title = t.error.issues[0].message;
        if (!tg.success) problems.tags = tg.error.issues[0].message;
        setLocal(problems);
        if (t.success && tg.success) save.mutate({ title: t.data, description: form.description.trim(), tags: tg.data });
      }}
    >
      <Field id="sketch-title" label="Title" value={form.title} maxLength={120} onChange={(e) => setForm({ ...form, title: e.target.value })} error={fieldError("title")} />
      <div className="space-y-1">
        <label htmlFor="sketch-description" className="block text-sm font-medium text-ink">
          Description
        </label>
        <textarea
          id="sketch-description"
          rows={3}
          maxLength={2000}
          value={form.description}
          onChange={(e) => setForm({ ...form, description: e.target.value })}
          className="block w-full rounded-md border border-rule bg-paper-card px-3 py-2 text-sm text-ink outline-none focus:border-ink focus:ring-2 focus:ring-accent/25"
        />
      </div>
      <Field id="sketch-tags" label="Tags" hint="Separated by commas, e.g. pumps, pier 7" value={form.tags} onChange={(e) => setForm({ ...form, tags: e.target.value })} error={fieldError("tags")} />
      {err && !err.fields.length ? <Notice tone="error">{err.message}</Notice> : null}
      <div className="flex gap-2">
        <Button type="submit" busy={save.isPending}>
          Save details
        </Button>
        <Button type="button" tone="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
