"use client";

import { zodResolver } from "@hookform/resolvers/zod";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import Link from "next/link";
import { useMemo, useState } from "react";
import { useForm } from "react-hook-form";
import { z } from "zod";
import { JobProgress } from "@/components/jobs/job-progress";
import { useJob } from "@/components/jobs/use-job";
import { BeforeAfterChart } from "@/components/louvers/before-after-chart";
import { allOpenTotalW, bandText, beforeAfterByZone, type OptimiseResultView } from "@/components/louvers/chart-data";
import { applyLouverSettings, asOptimiseResult, louverKeys, performanceQuery, startOptimiseJob, type HeadLayout } from "@/components/louvers/queries";
import { pmvText } from "@/components/results/format";
import { applyApiError, apiErrorMessage } from "@/components/ui/api-errors";
import { Button } from "@/components/ui/button";
import { FormField } from "@/components/ui/form-field";
import { ApiError } from "@/lib/client/query";

/**
 * The apply form: the revision message. The server's body schema (`applyLouversRequest` in
 * lib/louvers/service.ts, server-only) takes `message` as trimmed 1–200 characters or absent;
 * a blank field here is sent as absent, so the server's default message is used.
 */
export const applyFormSchema = z.object({ message: z.string().trim().max(200, "Too big: expected string to have <=200 characters") });
type ApplyForm = z.infer<typeof applyFormSchema>;

const watts = (w: number | undefined) => (w === undefined || !Number.isFinite(w) ? "—" : `${w.toFixed(0)} W`);

interface Props {
  projectId: string;
  scenarioId: string;
  scenarioName: string;
  head: HeadLayout;
  canOptimise: boolean;
  canApply: boolean;
  /** Reloads the head layout (after a conflict). */
  onReload: () => void;
}

/**
 * Automatic louver settings for one scenario over the head layout: run the optimiser as a job
 * (progress shown), show what it chose and what it does to each seat, and save it as a revision.
 */
export function AutomaticSettings({ projectId, scenarioId, scenarioName, head, canOptimise, canApply, onReload }: Props) {
  const [run, setRun] = useState<{ jobId: string; revision: number; scenarioId: string; appliedAs: number | null } | null>(null);
  const start = useMutation({
    mutationFn: () => startOptimiseJob(projectId, scenarioId),
    onSuccess: ({ jobId }) => setRun({ jobId, revision: head.revision, scenarioId, appliedAs: null }),
  });
  const job = useJob<unknown>(run?.jobId);
  const result = asOptimiseResult(job.result);
  // The run belongs to the scenario and revision it started on: another scenario, or a head
  // saved elsewhere, hides it; the revision it was applied as keeps it (and its message) shown.
  const current = run && run.scenarioId === scenarioId && (run.revision === head.revision || run.appliedAs === head.revision) ? run : null;

  return (
    <section aria-labelledby="automatic-title" className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id="automatic-title" className="text-lg font-semibold">
            Automatic louver settings
          </h2>
          <p className="max-w-3xl text-sm text-muted">
            Chooses each louvered panel&apos;s opening angle so that every occupied seat of each zone is inside the zone&apos;s target band with
            the least total panel output, for {scenarioName} on revision {head.revision}. Zone targets are set in the{" "}
            <Link className="text-accent-strong underline" href={`/projects/${projectId}/plan`}>
              plan editor
            </Link>{" "}
            (select a zone, then its properties).
          </p>
        </div>
        <Button onClick={() => start.mutate()} pending={start.isPending || (current !== null && !job.finished)} disabled={!canOptimise || !scenarioId}>
          Find louver settings
        </Button>
      </div>
      {!canOptimise ? <p className="text-sm text-muted">Your role does not run computations.</p> : null}
      {start.error ? (
        <p role="alert" className="text-sm text-danger">
          {apiErrorMessage(start.error)}
        </p>
      ) : null}
      {current ? <JobProgress label="Louver settings" status={job.status} progress={job.progress} error={job.error} /> : null}
      {current && result ? (
        <OptimiseResult
          key={current.jobId}
          projectId={projectId}
          scenarioId={current.scenarioId}
          revision={result.revision ?? current.revision}
          head={head}
          result={result}
          canApply={canApply}
          appliedAs={current.appliedAs}
          onApplied={(revision) => setRun((r) => (r ? { ...r, appliedAs: revision } : r))}
          onReload={() => {
            setRun(null);
            onReload();
          }}
        />
      ) : null}
    </section>
  );
}

function OptimiseResult({
  projectId,
  scenarioId,
  revision,
  head,
  result,
  canApply,
  appliedAs,
  onApplied,
  onReload,
}: {
  projectId: string;
  scenarioId: string;
  revision: number;
  head: HeadLayout;
  result: OptimiseResultView;
  canApply: boolean;
  appliedAs: number | null;
  onApplied: (revision: number) => void;
  onReload: () => void;
}) {
  const performance = useQuery(performanceQuery(projectId, scenarioId, revision));
  const zones = useMemo(() => beforeAfterByZone(result, head.layout), [result, head.layout]);
  const labels = useMemo(() => new Map(head.layout.panels.map((p) => [p.id, p.label])), [head.layout]);
  const seatLabels = useMemo(() => new Map(head.layout.seats.map((s) => [s.id, s.label])), [head.layout]);
  const curves = useMemo(() => new Map(performance.data?.panels.map((p) => [p.id, p.curve]) ?? []), [performance.data]);
  const allOpen = performance.data ? allOpenTotalW(result.panels.map((p) => p.id), curves) : null;
  const inTarget = result.seats.filter((s) => s.inTarget).length;
  const inTargetBefore = zones.flatMap((z) => z.seats).filter((s, i, all) => s.inTargetBefore && all.findIndex((x) => x.id === s.id) === i).length;

  return (
    <div className="space-y-6">
      <p role="status" className="rounded-md border border-line bg-white px-4 py-3 text-sm">
        <strong>{inTarget}</strong> of {result.seats.length} {result.seatSelection === "occupied" ? "occupied seats (seats with an occupant assigned)" : "seats inside a zone"} in
        target with the chosen settings (before: {inTargetBefore}). Total panel
        output <strong>{watts(result.totalOutputW)}</strong>
        {result.totalOutputBeforeW !== undefined ? <> (current settings {watts(result.totalOutputBeforeW)})</> : null}
        {allOpen && allOpen.missing === 0 ? (
          <>
            {" "}
            against <strong>{watts(allOpen.totalW)}</strong> with every louver fully open
            {allOpen.totalW > 0 ? ` — ${(100 * (1 - result.totalOutputW / allOpen.totalW)).toFixed(1)} % less` : ""}.
          </>
        ) : (
          "."
        )}
      </p>

      <div className="space-y-2">
        <h3 className="font-semibold">Chosen opening angles</h3>
        <div className="overflow-x-auto rounded-md border border-line bg-white">
          <table aria-label="Chosen louver settings" className="w-full text-sm">
            <thead className="bg-paper text-left text-xs uppercase tracking-wide text-muted">
              <tr>
                <th className="px-3 py-2">Panel</th>
                <th className="px-3 py-2">Allowed range (°)</th>
                <th className="px-3 py-2 text-right">Before (°)</th>
                <th className="px-3 py-2 text-right">Chosen (°)</th>
                <th className="px-3 py-2 text-right">Output before (W)</th>
                <th className="px-3 py-2 text-right">Output (W)</th>
              </tr>
            </thead>
            <tbody>
              {result.panels.map((p) => (
                <tr key={p.id} className="border-t border-line">
                  <th scope="row" className="px-3 py-1.5 text-left font-medium">
                    {p.label ?? labels.get(p.id) ?? p.id}
                  </th>
                  <td className="px-3 py-1.5">{p.minAngleDeg !== undefined && p.maxAngleDeg !== undefined ? `${p.minAngleDeg}–${p.maxAngleDeg}` : "—"}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{p.previousAngleDeg ?? "—"}</td>
                  <td className="px-3 py-1.5 text-right font-medium tabular-nums" data-col="angle">
                    {p.openingAngleDeg}
                  </td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{p.previousOutputW !== undefined ? p.previousOutputW.toFixed(0) : "—"}</td>
                  <td className="px-3 py-1.5 text-right tabular-nums">{p.outputW.toFixed(0)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        {result.panels.length === 0 ? <p className="text-sm text-muted">No active louvered panel in this scenario: there is nothing to set.</p> : null}
      </div>

      {result.unreachable.length > 0 ? (
        <section aria-label="Seats that cannot be brought inside" className="space-y-1 rounded-md border border-warm/40 bg-warm/5 px-4 py-3 text-sm">
          <h3 className="font-medium text-warm">
            {result.unreachable.length} seat{result.unreachable.length === 1 ? "" : "s"} cannot be brought inside the target
          </h3>
          <ul className="list-disc pl-5">
            {result.unreachable.map((u) => (
              <li key={u.seatId}>
                <strong>{seatLabels.get(u.seatId) ?? u.seatId}:</strong> {u.reason}
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <div className="space-y-2">
        <h3 className="font-semibold">PMV before and after, per zone</h3>
        <div className="grid gap-4 md:grid-cols-2">
          {zones.map((z) => (
            <BeforeAfterChart key={z.zoneId} zone={z} />
          ))}
        </div>
        <div className="overflow-x-auto rounded-md border border-line bg-white">
          <table aria-label="Seats before and after" className="w-full text-sm">
            <thead className="bg-paper text-left text-xs uppercase tracking-wide text-muted">
              <tr>
                <th className="px-3 py-2">Seat</th>
                <th className="px-3 py-2">Zone (target)</th>
                <th className="px-3 py-2 text-right">PMV before</th>
                <th className="px-3 py-2 text-right">PMV after</th>
                <th className="px-3 py-2">Target</th>
              </tr>
            </thead>
            <tbody>
              {zones.flatMap((z) =>
                z.seats.map((s) => (
                  <tr key={`${z.zoneId}:${s.id}`} className="border-t border-line" data-seat={s.id} data-zone={z.zoneId}>
                    <th scope="row" className="px-3 py-1.5 text-left font-medium">
                      {s.label}
                    </th>
                    <td className="px-3 py-1.5">
                      {z.name} <span className="text-muted">({bandText(z.target)})</span>
                    </td>
                    <td className="px-3 py-1.5 text-right tabular-nums" data-col="before">
                      {pmvText(s.pmvBefore)}
                    </td>
                    <td className="px-3 py-1.5 text-right font-medium tabular-nums" data-col="after">
                      {pmvText(s.pmvAfter)}
                    </td>
                    <td className="px-3 py-1.5" data-col="target">
                      {s.inTarget ? (
                        <span className="text-accent-strong">✓ in target</span>
                      ) : (
                        <span className="text-danger">✗ outside{s.unreachable ? ` — ${s.unreachable}` : ""}</span>
                      )}
                    </td>
                  </tr>
                )),
              )}
            </tbody>
          </table>
        </div>
      </div>

      {appliedAs !== null ? (
        <p role="status" className="rounded-md border border-accent/40 bg-accent/5 px-4 py-3 text-sm">
          Saved as <strong>revision {appliedAs}</strong>.{" "}
          <Link className="text-accent-strong underline" href={`/projects/${projectId}/plan`}>
            Open it in the plan editor
          </Link>
          .
        </p>
      ) : canApply ? (
        <ApplyResult projectId={projectId} baseRevision={revision} result={result} onApplied={onApplied} onReload={onReload} />
      ) : (
        <p className="text-sm text-muted">Designers and admins can save these settings as a new revision.</p>
      )}
    </div>
  );
}

function ApplyResult({
  projectId,
  baseRevision,
  result,
  onApplied,
  onReload,
}: {
  projectId: string;
  baseRevision: number;
  result: OptimiseResultView;
  onApplied: (revision: number) => void;
  onReload: () => void;
}) {
  const queryClient = useQueryClient();
  const form = useForm<ApplyForm>({ resolver: zodResolver(applyFormSchema), defaultValues: { message: "" } });
  const [formError, setFormError] = useState<string | null>(null);
  const [conflict, setConflict] = useState<string | null>(null);
  const apply = useMutation({
    mutationFn: (values: ApplyForm) =>
      applyLouverSettings(projectId, {
        baseRevision,
        panels: result.panels.map((p) => ({ id: p.id, openingAngleDeg: p.openingAngleDeg })),
        ...(values.message ? { message: values.message } : {}),
      }),
    onSuccess: (saved) => {
      onApplied(saved.revision);
      return queryClient.invalidateQueries({ queryKey: louverKeys.project(projectId) });
    },
    onError: (error) => {
      if (error instanceof ApiError && error.status === 409) {
        setConflict(error.message);
        setFormError(null);
      } else {
        setFormError(applyApiError(error, form.setError, ["message"]));
      }
    },
  });

  return (
    <form
      noValidate
      aria-label="Apply louver settings"
      className="space-y-3 rounded-md border border-line bg-white px-4 py-3"
      onSubmit={form.handleSubmit((values) => {
        setFormError(null);
        setConflict(null);
        apply.mutate(values);
      })}
    >
      <h3 className="font-semibold">Apply as new revision</h3>
      <p className="text-sm text-muted">
        Saves revision {baseRevision}&apos;s layout with these opening angles as a new head revision (history is kept).
      </p>
      <FormField
        label="Revision message"
        placeholder={`Automatic louver settings`}
        error={form.formState.errors.message?.message}
        {...form.register("message")}
      />
      <div aria-live="polite" className="text-sm text-danger">
        {formError}
        {conflict ? (
          <span>
            {conflict} Someone saved the plan after revision {baseRevision}, so these settings may no longer fit it.{" "}
            <Button variant="secondary" onClick={onReload}>
              Reload the plan and run again
            </Button>
          </span>
        ) : null}
      </div>
      <Button type="submit" pending={apply.isPending} disabled={result.panels.length === 0}>
        Apply as new revision
      </Button>
    </form>
  );
}
