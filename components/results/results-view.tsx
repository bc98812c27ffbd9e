"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useMemo, useState } from "react";
import { Button } from "@/components/ui/button";
import { InlineSelect } from "@/components/results/inline-select";
import { DateTime } from "@/components/ui/date-time";
import { SkeletonRows } from "@/components/ui/skeleton";
import { ResultWarnings, StandingCaution } from "@/components/results/cautions";
import { Comparison } from "@/components/results/comparison";
import { ComputeProgress } from "@/components/results/compute-progress";
import { PanelOutputChart } from "@/components/results/panel-output-chart";
import { PanelsTable } from "@/components/results/panels-table";
import { PmvDistributionChart } from "@/components/results/pmv-distribution-chart";
import { computeQuery, layoutAtQuery, revisionsQuery, scenariosQuery } from "@/components/projects/queries";
import { SeatsTable } from "@/components/results/seats-table";
import { ZonesTable } from "@/components/results/zones-table";
import { ApiError } from "@/lib/client/query";
import type { UnitSystem } from "@/lib/units";

interface Selection {
  scenarioId: string;
  revision: number;
}

function slug(text: string): string {
  return text.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || "project";
}

function ComputeError({ error }: { error: unknown }) {
  const fields = error instanceof ApiError ? error.fields : [];
  return (
    <div className="rounded-md border border-danger/30 bg-danger/5 px-4 py-3 text-sm text-danger">
      <p className="font-medium">{error instanceof ApiError ? error.message : "Seatwise could not be reached. Check your connection and try again."}</p>
      {fields.length > 0 ? (
        <ul className="mt-1 list-disc pl-5">
          {fields.map((f) => (
            <li key={`${f.path}:${f.message}`}>
              {f.path}: {f.message}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}

export function ResultsView({
  projectId,
  projectName,
  headRevision,
  system,
  canRun,
  canEditScenarios,
  initial,
}: {
  projectId: string;
  projectName: string;
  headRevision: number;
  system: UnitSystem;
  /** compute:run; without it the page can still show results another member computed into the cache. */
  canRun: boolean;
  canEditScenarios: boolean;
  initial: { scenarioId?: string; revision?: number };
}) {
  const scenarios = useQuery(scenariosQuery(projectId));
  const revisions = useQuery(revisionsQuery(projectId));
  const [scenarioChoice, setScenarioChoice] = useState(initial.scenarioId ?? "");
  const [revisionChoice, setRevisionChoice] = useState(initial.revision ?? headRevision);
  const [requested, setRequested] = useState<(Selection & { at: number }) | null>(null);

  const scenarioId = scenarioChoice || scenarios.data?.[0]?.id || "";
  const compute = useQuery({ ...computeQuery(projectId, requested?.scenarioId ?? "", requested?.revision ?? 0), enabled: requested !== null });
  const layout = useQuery({ ...layoutAtQuery(projectId, requested?.revision ?? 0), enabled: requested !== null });

  const roomNames = useMemo(() => new Map(layout.data?.layout.rooms.map((r) => [r.id, r.name]) ?? []), [layout.data]);
  const roomName = (id: string) => roomNames.get(id) ?? id;
  const result = compute.data;
  const scenarioName = scenarios.data?.find((s) => s.id === result?.scenarioId)?.name ?? "";
  const revisionInfo = revisions.data?.find((r) => r.number === result?.revision);

  if (scenarios.isPending || revisions.isPending) return <SkeletonRows rows={4} label="Loading scenarios and revisions…" />;
  if (scenarios.error || revisions.error) return <ComputeError error={scenarios.error ?? revisions.error} />;
  if (scenarios.data.length === 0) {
    return (
      <p className="rounded-md border border-line bg-white px-4 py-3 text-sm">
        This project has no design scenarios yet.{" "}
        {canEditScenarios ? (
          <Link className="text-accent-strong underline" href={`/projects/${projectId}/scenarios`}>
            Add a scenario
          </Link>
        ) : (
          "A designer adds them on the scenarios page."
        )}
      </p>
    );
  }

  return (
    <div className="space-y-8">
      <form
        className="no-print flex flex-wrap items-end gap-3 rounded-md border border-line bg-white px-4 py-3 text-sm"
        onSubmit={(e) => {
          e.preventDefault();
          setRequested({ scenarioId, revision: revisionChoice, at: Date.now() });
        }}
      >
        <InlineSelect label="Scenario" value={scenarioId} onChange={(e) => setScenarioChoice(e.target.value)}>
          {scenarios.data.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </InlineSelect>
        <InlineSelect label="Revision" value={revisionChoice} onChange={(e) => setRevisionChoice(Number(e.target.value))}>
          {revisions.data.map((r) => (
            <option key={r.number} value={r.number}>
              {r.number} — {r.message}
              {r.number === headRevision ? " (head)" : ""}
            </option>
          ))}
        </InlineSelect>
        <Button type="submit" pending={compute.isFetching} disabled={!canRun || !scenarioId}>
          Compute
        </Button>
        {!canRun ? <span className="text-muted">Your role does not run computations.</span> : null}
        {canEditScenarios ? (
          <Link className="ml-auto text-accent-strong underline-offset-4 hover:underline" href={`/projects/${projectId}/scenarios`}>
            Edit scenarios
          </Link>
        ) : null}
      </form>

      {requested && compute.isFetching ? <ComputeProgress key={requested.at} startedAt={requested.at} /> : null}
      {requested && compute.error ? <ComputeError error={compute.error} /> : null}
      {!requested ? <p className="text-sm text-muted">Pick a scenario and a revision, then compute.</p> : null}

      {result && !compute.isFetching ? (
        <>
          <div className="flex flex-wrap items-baseline justify-between gap-3">
            <h2 className="text-xl font-semibold">
              {scenarioName} · revision {result.revision}
              {revisionInfo ? <span className="font-normal text-muted"> — {revisionInfo.message}</span> : null}
            </h2>
            <p className="text-sm text-muted" role="status">
              {result.seats.length} seats, {result.panels.length} panels, {result.zones.length} zones · computed <DateTime iso={result.computedAt} />
              {result.cached ? " (from the cache: nothing changed)" : ` in ${Math.round(result.computeMs)} ms`} ·{" "}
              <Link
                className="text-accent-strong underline"
                href={`/projects/${projectId}/report?scenario=${result.scenarioId}&revision=${result.revision}`}
              >
                Printable report
              </Link>
            </p>
          </div>
          <StandingCaution />
          <ResultWarnings result={result} roomName={roomName} />
          <SeatsTable seats={result.seats} zones={result.zones} system={system} fileStem={`${slug(projectName)}-${slug(scenarioName)}-r${result.revision}`} />
          <section className="space-y-3" aria-labelledby="zones-title">
            <h2 id="zones-title" className="text-lg font-semibold">
              Zones
            </h2>
            <ZonesTable zones={result.zones} />
          </section>
          <PmvDistributionChart seats={result.seats} zones={result.zones} />
          <section className="space-y-3" aria-labelledby="panels-title">
            <h2 id="panels-title" className="text-lg font-semibold">
              Panels
            </h2>
            <PanelsTable panels={result.panels} system={system} roomName={roomName} />
          </section>
          <PanelOutputChart panels={result.panels} system={system} />
        </>
      ) : null}

      {canRun ? <Comparison projectId={projectId} scenarios={scenarios.data} revisions={revisions.data} system={system} /> : null}
    </div>
  );
}
