"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation } from "@tanstack/react-query";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import type { z } from "zod";
import { Button } from "@/components/ui/button";
import { FormAlert } from "@/components/ui/form-alert";
import { FormField } from "@/components/ui/form-field";
import { applyApiError } from "@/components/ui/api-errors";
import { api } from "@/lib/client/query";
import { projectInput } from "@/lib/projects/schemas";

type Values = z.input<typeof projectInput>;

/** Creates a project (revision 1, an empty layout) and refreshes the server-rendered list. */
export function NewProjectForm() {
  const router = useRouter();
  const [message, setMessage] = useState<string | null>(null);
  const [created, setCreated] = useState<{ id: string; name: string } | null>(null);
  const form = useForm<Values, unknown, z.output<typeof projectInput>>({
    resolver: zodResolver(projectInput),
    defaultValues: { name: "", description: "" },
  });
  const create = useMutation({
    mutationFn: (body: z.output<typeof projectInput>) => api<{ id: string; name: string }>("/api/projects", { method: "POST", body }),
    onSuccess: (project) => {
      setCreated(project);
      form.reset();
      router.refresh();
    },
    onError: (error) => setMessage(applyApiError(error, form.setError, ["name", "description"])),
  });
  const { errors } = form.formState;

  return (
    <form
      noValidate
      aria-labelledby="new-project-heading"
      className="space-y-4 rounded-lg border border-line bg-white p-4"
      onSubmit={form.handleSubmit((values) => {
        setMessage(null);
        setCreated(null);
        create.mutate(values);
      })}
    >
      <h2 id="new-project-heading" className="font-semibold">
        New project
      </h2>
      <FormField label="Project name" placeholder="e.g. North wing, level 2" error={errors.name?.message} {...form.register("name")} />
      <div className="space-y-1">
        <label htmlFor="new-project-description" className="block text-sm font-medium">
          Description
        </label>
        <textarea
          id="new-project-description"
          rows={3}
          aria-invalid={errors.description ? true : undefined}
          aria-describedby="new-project-description-error"
          className="block w-full rounded-md border border-line bg-white px-3 py-2 text-sm focus:border-accent focus:outline-2 focus:outline-accent/30"
          {...form.register("description")}
        />
        <p id="new-project-description-error" aria-live="polite" className="text-sm text-danger">
          {errors.description?.message}
        </p>
      </div>
      <FormAlert>{message}</FormAlert>
      <FormAlert tone="success">
        {created ? (
          <>
            Created{" "}
            <Link href={`/projects/${created.id}`} className="font-medium underline">
              {created.name}
            </Link>
            .
          </>
        ) : null}
      </FormAlert>
      <Button type="submit" pending={create.isPending}>
        Create project
      </Button>
    </form>
  );
}
