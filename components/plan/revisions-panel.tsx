"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { projectKeys, restoreRevision, revisionsQuery, type LayoutAtRevision } from "@/components/projects/queries";
import { apiErrorMessage } from "@/components/ui/api-errors";
import { DateTime } from "@/components/ui/date-time";

interface Props {
  projectId: string;
  baseRevision: number;
  dirty: boolean;
  readOnly: boolean;
  onRestored: (head: LayoutAtRevision) => void;
}

/** The project's revisions, newest first; Restore saves the old layout as a new revision. */
export function RevisionsPanel({ projectId, baseRevision, dirty, readOnly, onRestored }: Props) {
  const queryClient = useQueryClient();
  const revisions = useQuery(revisionsQuery(projectId));
  const restore = useMutation({
    mutationFn: (number: number) => restoreRevision(projectId, number, baseRevision),
    onSuccess: (head) => {
      void queryClient.invalidateQueries({ queryKey: projectKeys.revisions(projectId) });
      queryClient.setQueryData(projectKeys.layout(projectId), head);
      onRestored(head);
    },
  });

  if (revisions.isPending) return <p className="text-sm text-muted">Loading revisions…</p>;
  if (revisions.isError) return <p className="text-sm text-danger">{apiErrorMessage(revisions.error)}</p>;
  return (
    <div className="space-y-2 text-sm">
      <ol className="max-h-72 space-y-1 overflow-y-auto">
        {revisions.data.map((r) => (
          <li key={r.number} className="flex items-start justify-between gap-2 rounded border border-line/60 px-2 py-1.5">
            <div className="min-w-0">
              <p className="font-medium">
                Revision {r.number}
                {r.number === baseRevision ? <span className="ml-1 text-xs font-normal text-accent-strong">(open)</span> : null}
              </p>
              <p className="truncate text-muted" title={r.message}>
                {r.message}
              </p>
              <p className="text-xs text-muted">
                {r.authorName ?? "Unknown"} · <DateTime iso={r.createdAt} />
              </p>
            </div>
            {readOnly || r.number === baseRevision ? null : (
              <button
                type="button"
                className="shrink-0 rounded border border-line px-2 py-0.5 text-xs hover:border-accent disabled:opacity-50"
                disabled={restore.isPending}
                aria-label={`Restore revision ${r.number}`}
                onClick={() => {
                  if (dirty && !window.confirm("Restoring discards your unsaved changes. Continue?")) return;
                  restore.mutate(r.number);
                }}
              >
                Restore
              </button>
            )}
          </li>
        ))}
      </ol>
      <p aria-live="polite" className="text-danger">
        {restore.isError ? apiErrorMessage(restore.error) : null}
      </p>
    </div>
  );
}
