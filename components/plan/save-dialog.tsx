"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useEffect, useRef, useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { projectKeys, saveLayout, type LayoutAtRevision } from "@/components/projects/queries";
import { Button } from "@/components/ui/button";
import { FormField } from "@/components/ui/form-field";
import { ApiError } from "@/lib/client/query";
import { layoutSchema, type Layout } from "@/lib/layout/schema";
import { describeLayoutPath } from "@/lib/plan/paths";
import { saveLayoutInput } from "@/lib/projects/schemas";

const messageForm = z.strictObject({ message: saveLayoutInput.shape.message });
type MessageForm = z.infer<typeof messageForm>;

interface Props {
  projectId: string;
  layout: Layout;
  baseRevision: number;
  onClose: () => void;
  onSaved: (saved: LayoutAtRevision, sent: Layout) => void;
  /** Discard the edit and load the head revision. */
  onReload: () => Promise<void>;
}

export function SaveDialog({ projectId, layout, baseRevision, onClose, onSaved, onReload }: Props) {
  const queryClient = useQueryClient();
  const [conflict, setConflict] = useState<{ headRevision: number; message: string } | null>(null);
  const [problem, setProblem] = useState<{ message: string; fields: string[] } | null>(null);
  const dialogRef = useRef<HTMLDivElement>(null);
  const { register, handleSubmit, formState, setError } = useForm<MessageForm>({ resolver: zodResolver(messageForm), defaultValues: { message: "" } });

  const save = useMutation({
    mutationFn: (vars: { message: string; baseRevision: number }) => saveLayout(projectId, { ...vars, layout }),
    onSuccess: (saved) => {
      void queryClient.invalidateQueries({ queryKey: projectKeys.revisions(projectId) });
      queryClient.setQueryData(projectKeys.layout(projectId), saved);
      onSaved(saved, layout);
    },
    onError: (error, vars) => {
      if (error instanceof ApiError && error.status === 409 && typeof error.body.headRevision === "number") {
        setConflict({ headRevision: error.body.headRevision, message: vars.message });
        return;
      }
      if (error instanceof ApiError && error.status === 400) {
        const message = error.fields.find((f) => f.path === "message");
        if (message) setError("message", { type: "server", message: message.message });
        setProblem({ message: error.message, fields: error.fields.filter((f) => f.path !== "message").map((f) => `${describeLayoutPath(layout, f.path)}: ${f.message}`) });
        return;
      }
      setProblem({ message: error instanceof ApiError ? error.message : "Seatwise could not be reached. Check your connection and try again.", fields: [] });
    },
  });

  useEffect(() => {
    dialogRef.current?.querySelector<HTMLElement>("input, button")?.focus();
    const onKey = (e: KeyboardEvent) => {
      if (e.key === "Escape") onClose();
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [onClose]);

  const [reloading, setReloading] = useState(false);

  /** The same whole-layout check the server makes (ids, rooms referred to, edges), before sending. */
  const submit = (message: string) => {
    const checked = layoutSchema.safeParse(layout);
    if (!checked.success) {
      setProblem({
        message: "The layout has problems to fix before it can be saved.",
        fields: checked.error.issues.map((i) => `${describeLayoutPath(layout, i.path.join("."))}: ${i.message}`),
      });
      return;
    }
    setProblem(null);
    save.mutate({ message, baseRevision });
  };

  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-ink/30 p-4">
      <div ref={dialogRef} role="dialog" aria-modal="true" aria-labelledby="save-dialog-title" className="w-full max-w-md space-y-4 rounded-lg bg-white p-5 shadow-xl">
        <h2 id="save-dialog-title" className="text-lg font-semibold">
          Save a new revision
        </h2>
        {conflict ? (
          <div className="space-y-3" role="alert">
            <p className="font-medium text-danger">Revision {conflict.headRevision} was saved meanwhile.</p>
            <p className="text-sm text-muted">
              Your edit started from revision {baseRevision}. Discard your changes and load revision {conflict.headRevision}, or save your layout as a new
              revision on top of it (it replaces what revision {conflict.headRevision} changed).
            </p>
            <div className="flex flex-wrap gap-2">
              <Button
                variant="secondary"
                pending={reloading}
                onClick={async () => {
                  setReloading(true);
                  try {
                    await onReload();
                  } finally {
                    setReloading(false);
                  }
                }}
              >
                Reload (discard my changes)
              </Button>
              <Button pending={save.isPending} onClick={() => save.mutate({ message: conflict.message, baseRevision: conflict.headRevision })}>
                Save as a new revision on top
              </Button>
            </div>
          </div>
        ) : (
          <form noValidate onSubmit={handleSubmit((v) => submit(v.message))} className="space-y-3">
            <FormField label="Revision message" placeholder="What changed?" autoComplete="off" error={formState.errors.message?.message} {...register("message")} />
            <div className="flex justify-end gap-2">
              <Button variant="secondary" onClick={onClose}>
                Cancel
              </Button>
              <Button type="submit" pending={save.isPending}>
                Save revision
              </Button>
            </div>
          </form>
        )}
        <div aria-live="polite" className="text-sm text-danger">
          {problem ? (
            <>
              <p>{problem.message}</p>
              {problem.fields.length > 0 ? (
                <ul className="mt-1 list-disc pl-5">
                  {problem.fields.map((f) => (
                    <li key={f}>{f}</li>
                  ))}
                </ul>
              ) : null}
            </>
          ) : null}
        </div>
      </div>
    </div>
  );
}
