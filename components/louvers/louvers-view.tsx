"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { AutomaticSettings } from "@/components/louvers/automatic-settings";
import { EnergyView, LoadsView } from "@/components/louvers/energy-loads";
import { PerformanceView } from "@/components/louvers/performance-view";
import { headLayoutQuery, scenariosQuery } from "@/components/projects/queries";
import { StandingCaution } from "@/components/results/cautions";
import { InlineSelect } from "@/components/results/inline-select";
import { apiErrorMessage } from "@/components/ui/api-errors";
import { SkeletonRows } from "@/components/ui/skeleton";

const TABS = [
  { id: "automatic", label: "Automatic settings" },
  { id: "performance", label: "Panel performance" },
  { id: "loads", label: "Loads and water side" },
  { id: "energy", label: "Schedules and energy" },
] as const;
type TabId = (typeof TABS)[number]["id"];

interface Props {
  projectId: string;
  /** compute:run — run the optimiser and the PMV sweep. */
  canOptimise: boolean;
  /** layouts:write — save the chosen settings as a revision. */
  canApply: boolean;
}

/** The louver planning screen: one scenario over the head layout, in four tabs. */
export function LouversView({ projectId, canOptimise, canApply }: Props) {
  const scenarios = useQuery(scenariosQuery(projectId));
  const head = useQuery(headLayoutQuery(projectId));
  const [scenarioChoice, setScenarioChoice] = useState("");
  const [tab, setTab] = useState<TabId>("automatic");

  if (scenarios.isPending || head.isPending) return <SkeletonRows rows={4} label="Loading the plan and its scenarios…" />;
  if (scenarios.error || head.error) {
    return (
      <p role="alert" className="text-sm text-danger">
        {apiErrorMessage(scenarios.error ?? head.error)}
      </p>
    );
  }
  if (scenarios.data.length === 0) {
    return (
      <p className="rounded-md border border-line bg-white px-4 py-3 text-sm">
        This project has no design scenarios yet.{" "}
        <Link className="text-accent-strong underline" href={`/projects/${projectId}/scenarios`}>
          Scenarios
        </Link>
      </p>
    );
  }
  const scenario = scenarios.data.find((s) => s.id === scenarioChoice) ?? scenarios.data[0]!;
  const revision = head.data.revision;

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end gap-4 rounded-md border border-line bg-white px-4 py-3 text-sm">
        <InlineSelect label="Scenario" value={scenario.id} onChange={(e) => setScenarioChoice(e.target.value)}>
          {scenarios.data.map((s) => (
            <option key={s.id} value={s.id}>
              {s.name}
            </option>
          ))}
        </InlineSelect>
        <p className="pb-1.5 text-muted">
          Head layout: revision {revision}
          {head.data.message ? ` — ${head.data.message}` : ""}
        </p>
      </div>

      <StandingCaution />

      <div role="tablist" aria-label="Louver views" className="flex flex-wrap gap-1 border-b border-line">
        {TABS.map((t) => (
          <button
            key={t.id}
            type="button"
            role="tab"
            id={`tab-${t.id}`}
            aria-selected={tab === t.id}
            aria-controls={`panel-${t.id}`}
            onClick={() => setTab(t.id)}
            className={`-mb-px rounded-t-md border px-3.5 py-2 text-sm font-medium ${
              tab === t.id ? "border-line border-b-paper bg-paper text-ink" : "border-transparent text-muted hover:text-ink"
            }`}
          >
            {t.label}
          </button>
        ))}
      </div>

      <div role="tabpanel" id={`panel-${tab}`} aria-labelledby={`tab-${tab}`}>
        {tab === "automatic" ? (
          <AutomaticSettings
            projectId={projectId}
            scenarioId={scenario.id}
            scenarioName={scenario.name}
            head={head.data}
            canOptimise={canOptimise}
            canApply={canApply}
            onReload={() => void head.refetch()}
          />
        ) : null}
        {tab === "performance" ? (
          <PerformanceView projectId={projectId} scenarioId={scenario.id} revision={revision} layout={head.data.layout} canSweep={canOptimise} />
        ) : null}
        {tab === "loads" ? <LoadsView projectId={projectId} scenarioId={scenario.id} revision={revision} /> : null}
        {tab === "energy" ? <EnergyView projectId={projectId} scenarioId={scenario.id} revision={revision} canEdit={canApply} /> : null}
      </div>
    </div>
  );
}
