"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { DateTime } from "@/components/ui/date-time";
import { SkeletonRows } from "@/components/ui/skeleton";
import { apiErrorMessage } from "@/components/ui/api-errors";
import { scenariosQuery, type Scenario } from "@/components/projects/queries";
import { ScenarioForm } from "@/components/scenarios/scenario-form";
import { quantityUnit, displayText } from "@/components/scenarios/display-units";
import { WINTER_DESIGN, type ScenarioInput } from "@/lib/scenarios/schema";
import type { UnitSystem } from "@/lib/units";

const NEW = "new";

function inputOf(s: Scenario): ScenarioInput {
  return { name: s.name, conditions: s.conditions };
}

/** Scenario list beside the form for the selected one (or a new one). */
export function ScenariosEditor({ projectId, system, canWrite }: { projectId: string; system: UnitSystem; canWrite: boolean }) {
  const scenarios = useQuery(scenariosQuery(projectId));
  const [selected, setSelected] = useState<string | null>(null);

  if (scenarios.isPending) return <SkeletonRows rows={3} label="Loading scenarios…" />;
  if (scenarios.error) return <p className="text-sm text-danger">{apiErrorMessage(scenarios.error)}</p>;

  const list = scenarios.data;
  const current = selected === NEW ? null : (list.find((s) => s.id === selected) ?? list[0] ?? null);
  const creating = selected === NEW || (current === null && canWrite);
  const t = quantityUnit("temperature", system);

  return (
    <div className="grid gap-8 lg:grid-cols-[16rem_1fr]">
      <nav aria-label="Scenarios" className="space-y-2">
        <ul className="space-y-1">
          {list.map((s) => {
            const active = !creating && current?.id === s.id;
            return (
              <li key={s.id}>
                <button
                  type="button"
                  aria-current={active ? "true" : undefined}
                  onClick={() => setSelected(s.id)}
                  className={`w-full rounded-md border px-3 py-2 text-left text-sm ${active ? "border-accent bg-accent/5" : "border-line bg-white hover:border-accent"}`}
                >
                  <span className="block font-medium">{s.name}</span>
                  <span className="block text-xs text-muted">
                    air {displayText(t, s.conditions.airTemperatureC)} {t.symbol}, outdoor {displayText(t, s.conditions.outdoorTemperatureC)} {t.symbol} ·{" "}
                    {s.conditions.activeModes.join(" + ") || "panels off"}
                  </span>
                  <span className="block text-xs text-muted">
                    changed <DateTime iso={s.updatedAt} />
                  </span>
                </button>
              </li>
            );
          })}
        </ul>
        {list.length === 0 ? <p className="text-sm text-muted">No scenarios yet.</p> : null}
        {canWrite ? (
          <Button variant="secondary" className="w-full" onClick={() => setSelected(NEW)} disabled={creating}>
            New scenario
          </Button>
        ) : null}
        <Link href={`/projects/${projectId}/results`} className="block pt-2 text-sm text-accent-strong underline-offset-4 hover:underline">
          Go to results
        </Link>
      </nav>
      <section aria-label="Scenario details" className="rounded-md border border-line bg-white p-5">
        {creating ? (
          <>
            <h2 className="mb-4 text-lg font-semibold">New scenario</h2>
            <ScenarioForm
              key={`new:${system}`}
              projectId={projectId}
              scenario={null}
              initial={{ name: "", conditions: WINTER_DESIGN.conditions }}
              system={system}
              canWrite={canWrite}
              onSaved={(saved) => setSelected(saved.id)}
            />
          </>
        ) : current ? (
          <>
            <h2 className="mb-4 text-lg font-semibold">{current.name}</h2>
            <ScenarioForm
              key={`${current.id}:${current.version}:${system}`}
              projectId={projectId}
              scenario={current}
              initial={inputOf(current)}
              system={system}
              canWrite={canWrite}
              onSaved={(saved) => setSelected(saved.id)}
            />
          </>
        ) : (
          <p className="text-sm text-muted">This project has no scenarios yet; designers and admins add them.</p>
        )}
      </section>
    </div>
  );
}
