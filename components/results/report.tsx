import type { ReactNode } from "react";
import { DESIGN_ESTIMATE_CAUTION, ResultWarnings, SAFETY_CAUTIONS } from "@/components/results/cautions";
import { num, percent, pmvText } from "@/components/results/format";
import { PanelsTable } from "@/components/results/panels-table";
import { sortSeatRows, toSeatRows } from "@/components/results/seat-rows";
import { ZonesTable } from "@/components/results/zones-table";
import { SURFACE_CLASSES, insideTemperatureC } from "@/components/scenarios/surfaces";
import { DateTime } from "@/components/ui/date-time";
import type { ComputeResult } from "@/lib/compute/types";
import type { Layout, Panel } from "@/lib/layout/schema";
import type { ScenarioConditions } from "@/lib/scenarios/schema";
import { unitSymbol, type UnitSystem } from "@/lib/units";

export interface ReportInput {
  project: { name: string; description: string };
  revision: { number: number; message: string; authorName: string | null; createdAt: string; isHead: boolean };
  scenario: { name: string; conditions: ScenarioConditions; updatedAt: string };
  layout: Layout;
  result: ComputeResult;
  generatedAt: string;
  preparedBy: string;
  system: UnitSystem;
}

/**
 * The methods and standards behind the numbers, as cited in lib/comfort, lib/viewfactor,
 * lib/panels (REFERENCES.md) and lib/scenarios/surface-temperature.ts.
 */
export const METHODS: ReadonlyArray<{ topic: string; text: string; sources: readonly string[] }> = [
  {
    topic: "PMV, PPD and local discomfort",
    text: "Predicted mean vote and predicted percentage dissatisfied per seat from air temperature, mean radiant temperature, air speed, humidity, clothing and activity; percentage dissatisfied from radiant temperature asymmetry; categories A–C.",
    sources: [
      "ISO 7730:2005, Ergonomics of the thermal environment — Analytical determination and interpretation of thermal comfort using calculation of the PMV and PPD indices and local thermal comfort criteria: clause 4 (PMV, PPD), clause 6 (local thermal discomfort, radiant asymmetry 6.5), Annex A (categories).",
      "ANSI/ASHRAE Standard 55-2017, Thermal Environmental Conditions for Human Occupancy: PMV comfort band, local discomfort limits, operative temperature (Normative Appendix A).",
    ],
  },
  {
    topic: "Angle factors, plane radiant temperature and mean radiant temperature",
    text: "View factors from small plane elements at the body centre (0.6 m seated, 1.0 m standing) to every room surface and panel by contour integration; plane radiant temperatures in six directions; mean radiant temperature by the projected-area weighting for the posture; operative temperature.",
    sources: [
      "ISO 7726:1998, Ergonomics of the thermal environment — Instruments for measuring physical quantities: Annex C (angle factors, plane radiant temperature, radiant temperature asymmetry, mean radiant temperature).",
      "M. F. Modest, Radiative Heat Transfer, 3rd ed., Academic Press, 2013, ch. 4 (view factors by contour integration).",
    ],
  },
  {
    topic: "Surface temperatures from U-values",
    text: "Inside surface temperature t_si = t_i − U·R_si·(t_i − t_e) with the conventional inside surface resistances (0.10 m²K/W upward, 0.13 horizontal, 0.17 downward heat flow).",
    sources: ["ISO 6946:2017, Building components and building elements — Thermal resistance and thermal transmittance — Calculation methods: clause 6, Annex A, Table 7."],
  },
  {
    topic: "Panel heat output",
    text: "Radiant and convective exchange of each panel surface with the room; panels with a mean water temperature use their product characteristic Q = K·ΔTⁿ; louvered panels through the apparent emissivity of their V-groove cavities.",
    sources: [
      "EN 1264-2:2021 / EN 1264-5:2021, Water based surface embedded heating and cooling systems (Part 5: conversion to wall and ceiling heating and to cooling).",
      "ISO 11855-2:2012, Building environment design — Design, dimensioning, installation and control of embedded radiant heating and cooling systems — Part 2: Determination of the design heating and cooling capacity.",
      "EN 442-2:2014, Radiators and convectors — Part 2: Test methods and rating (characteristic equation).",
      "J. R. Howell, M. P. Mengüç, K. Daun, R. Siegel, Thermal Radiation Heat Transfer, 7th ed., CRC Press, 2021 (apparent emissivity of cavities).",
    ],
  },
  {
    topic: "Dew point and condensation margin",
    text: "Dew point of the room air from its temperature and relative humidity by the Magnus form; the margin of each chilled panel is its surface temperature minus the dew point.",
    sources: [
      "O. A. Alduchov, R. E. Eskridge, “Improved Magnus form approximation of saturation vapor pressure”, Journal of Applied Meteorology 35 (1996) 601–609.",
    ],
  },
];

export const SIMPLIFICATIONS: readonly string[] = [
  "Steady state: no thermal mass, solar gains or transients.",
  "Uniform air temperature, humidity and air speed per scenario; no vertical air temperature gradient or draught from the air distribution.",
  "Room surfaces are treated as black for the occupant; panels as grey with their emissivity.",
  "No obstruction between surfaces and occupants (furniture, partitions, the other wing of an L-shaped room).",
  "A ceiling panel hung below the ceiling is modelled in its own plane but still covers the ceiling area above it.",
];

function Section({ title, children, breakBefore = false }: { title: string; children: ReactNode; breakBefore?: boolean }) {
  return (
    <section className={`space-y-3 ${breakBefore ? "page-break" : ""}`}>
      <h2 className="border-b border-line pb-1 text-lg font-semibold">{title}</h2>
      {children}
    </section>
  );
}

function KeyValues({ rows, label }: { rows: ReadonlyArray<[string, ReactNode]>; label: string }) {
  return (
    <table aria-label={label} className="keep-together w-full max-w-2xl text-sm">
      <tbody>
        {rows.map(([k, v]) => (
          <tr key={k} className="border-t border-line/70">
            <th scope="row" className="w-1/2 py-1 pr-4 text-left font-medium">
              {k}
            </th>
            <td className="py-1">{v}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function supplyText(p: Panel, system: UnitSystem): string {
  const t = unitSymbol("temperature", system);
  if (p.supply.kind === "surface") return `surface ${num("temperature", p.supply.surfaceTemperatureC, system)} ${t}`;
  return `mean water ${num("temperature", p.supply.meanWaterTemperatureC, system)} ${t}, Q = ${p.supply.characteristic.kWm2PerKn}·ΔT^${p.supply.characteristic.n} W/m²`;
}

export function ComfortReport({ input }: { input: ReportInput }) {
  const { project, revision, scenario, layout, result, system } = input;
  const c = scenario.conditions;
  const t = unitSymbol("temperature", system);
  const dt = unitSymbol("temperatureDifference", system);
  const len = unitSymbol("length", system);
  const rooms = new Map(layout.rooms.map((r) => [r.id, r.name]));
  const roomName = (id: string) => rooms.get(id) ?? id;
  const panelResults = new Map(result.panels.map((p) => [p.id, p]));
  const seatRows = sortSeatRows(toSeatRows(result.seats, result.zones), { key: "label", direction: "asc" });
  const compliant = result.seats.filter((s) => s.ashrae55.compliant).length;
  const byCategory = (cat: "A" | "B" | "C" | null) => result.seats.filter((s) => s.category === cat).length;
  const totalHeating = result.panels.filter((p) => p.active && p.mode === "heating").reduce((sum, p) => sum + p.outputW, 0);
  const totalCooling = result.panels.filter((p) => p.active && p.mode === "cooling").reduce((sum, p) => sum + p.outputW, 0);

  return (
    <article className="comfort-report space-y-8">
      <header className="space-y-3 border-b-2 border-ink pb-4">
        <p className="text-sm tracking-wide text-muted uppercase">Seatwise comfort report</p>
        <h1 className="text-2xl font-semibold">{project.name}</h1>
        <KeyValues
          label="Report details"
          rows={[
            ["Layout revision", `${revision.number}${revision.isHead ? " (head)" : ""} — ${revision.message}`],
            [
              "Revision saved",
              <>
                <DateTime iso={revision.createdAt} /> by {revision.authorName ?? "a former member"}
              </>,
            ],
            [
              "Design scenario",
              <>
                {scenario.name} (last changed <DateTime iso={scenario.updatedAt} />)
              </>,
            ],
            ["Computed", <DateTime key="computed" iso={result.computedAt} />],
            [
              "Report date",
              <>
                <DateTime iso={input.generatedAt} />, prepared by {input.preparedBy}
              </>,
            ],
            ["Units", system === "si" ? "SI (°C, K, m, W)" : "IP (°F, ft, Btu/h); U-values in W/(m²·K)"],
          ]}
        />
        <p className="rounded-md border border-warm/40 bg-warm/5 px-3 py-2 text-sm">
          <strong className="text-warm">Design estimate.</strong> {DESIGN_ESTIMATE_CAUTION}
        </p>
      </header>

      <Section title="1. Inputs">
        <h3 className="font-medium">Design conditions</h3>
        <KeyValues
          label="Design conditions"
          rows={[
            ["Air temperature", `${num("temperature", c.airTemperatureC, system)} ${t}`],
            ["Relative humidity", `${c.relativeHumidityPercent} %`],
            ["Air speed", `${num("speed", c.airSpeedMps, system, system === "si" ? 2 : 0)} ${unitSymbol("speed", system)}`],
            ["Clothing (default)", `${c.defaultClo} clo`],
            ["Activity (default)", `${c.defaultMet} met`],
            ["Outdoor design temperature", `${num("temperature", c.outdoorTemperatureC, system)} ${t}`],
            ["Active panel modes", c.activeModes.length > 0 ? c.activeModes.join(", ") : "none (all panels off)"],
          ]}
        />
        <h3 className="font-medium">Room surfaces</h3>
        <table aria-label="Room surfaces" className="keep-together w-full max-w-3xl text-sm">
          <thead className="text-left">
            <tr>
              <th scope="col" className="py-1 pr-4 font-medium">Surface</th>
              <th scope="col" className="py-1 pr-4 font-medium">Given as</th>
              <th scope="col" className="py-1 text-right font-medium">Inside surface ({t})</th>
            </tr>
          </thead>
          <tbody>
            {SURFACE_CLASSES.map((sc) => {
              const thermal = c.surfaces[sc.key];
              return (
                <tr key={sc.key} className="border-t border-line/70">
                  <th scope="row" className="py-1 pr-4 text-left font-medium">{sc.label}</th>
                  <td className="py-1 pr-4">
                    {thermal === null
                      ? "at the air temperature"
                      : thermal.kind === "uValue"
                        ? `U = ${thermal.uValueWm2K} W/(m²·K) (ISO 6946)`
                        : "surface temperature"}
                  </td>
                  <td className="py-1 text-right font-mono">
                    {num("temperature", insideTemperatureC(thermal, c.airTemperatureC, c.outdoorTemperatureC, sc.position), system)}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
        <h3 className="font-medium">Layout</h3>
        <p className="text-sm">
          {layout.rooms.length} rooms, {layout.openings.length} openings, {layout.panels.length} panels, {layout.seats.length} seats, {layout.zones.length}{" "}
          comfort zones.
        </p>
        <div className="overflow-x-auto">
          <table aria-label="Panel list" className="w-full text-sm">
            <thead className="text-left">
              <tr>
                <th scope="col" className="py-1 pr-3 font-medium">Panel</th>
                <th scope="col" className="py-1 pr-3 font-medium">Room</th>
                <th scope="col" className="py-1 pr-3 font-medium">Mounting</th>
                <th scope="col" className="py-1 pr-3 font-medium">Mode</th>
                <th scope="col" className="py-1 pr-3 font-medium">Size ({len})</th>
                <th scope="col" className="py-1 pr-3 font-medium">Supply</th>
                <th scope="col" className="py-1 pr-3 font-medium">Emissivity</th>
                <th scope="col" className="py-1 pr-3 font-medium">Louver</th>
                <th scope="col" className="py-1 text-right font-medium">Surface in this scenario ({t})</th>
              </tr>
            </thead>
            <tbody>
              {layout.panels.map((p) => {
                const r = panelResults.get(p.id);
                return (
                  <tr key={p.id} className="border-t border-line/70">
                    <th scope="row" className="py-1 pr-3 text-left font-medium">{p.label}</th>
                    <td className="py-1 pr-3">{roomName(p.roomId)}</td>
                    <td className="py-1 pr-3">{p.mounting}</td>
                    <td className="py-1 pr-3">
                      {p.mode}
                      {r && !r.active ? " (off)" : ""}
                    </td>
                    <td className="py-1 pr-3 font-mono">
                      {num("length", p.widthM, system, 2)} × {num("length", p.lengthM, system, 2)}
                    </td>
                    <td className="py-1 pr-3">{supplyText(p, system)}</td>
                    <td className="py-1 pr-3 font-mono">{p.emissivity}</td>
                    <td className="py-1 pr-3">{p.louver ? `${p.louver.openingAngleDeg}° open, ${p.louver.finish}` : "—"}</td>
                    <td className="py-1 text-right font-mono">{r ? num("temperature", r.surfaceTemperatureC, system) : "—"}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      </Section>

      <Section title="2. Results" breakBefore>
        <KeyValues
          label="Summary"
          rows={[
            ["Seats", String(result.seats.length)],
            ["ISO 7730 category A / B / C / outside", `${byCategory("A")} / ${byCategory("B")} / ${byCategory("C")} / ${byCategory(null)}`],
            ["ASHRAE 55 compliant seats", `${compliant} of ${result.seats.length} (${percent(result.seats.length ? compliant / result.seats.length : null)})`],
            ["Heating output of active panels", `${num("power", totalHeating, system, 0)} ${unitSymbol("power", system)}`],
            ["Cooling output of active panels", `${num("power", totalCooling, system, 0)} ${unitSymbol("power", system)}`],
          ]}
        />
        <ResultWarnings result={result} roomName={roomName} />
        <h3 className="font-medium">Zones</h3>
        <ZonesTable zones={result.zones} />
      </Section>

      <Section title="3. Seats" breakBefore>
        <div className="overflow-x-auto">
          <table aria-label="Seats" className="w-full text-sm">
            <thead className="text-left">
              <tr>
                <th scope="col" className="py-1 pr-2 font-medium">Seat</th>
                <th scope="col" className="py-1 pr-2 font-medium">Zones</th>
                <th scope="col" className="py-1 pr-2 text-right font-medium">PMV</th>
                <th scope="col" className="py-1 pr-2 text-right font-medium">PPD (%)</th>
                <th scope="col" className="py-1 pr-2 text-right font-medium">MRT ({t})</th>
                <th scope="col" className="py-1 pr-2 text-right font-medium">Operative ({t})</th>
                <th scope="col" className="py-1 pr-2 text-right font-medium">Vert. asym. ({dt})</th>
                <th scope="col" className="py-1 pr-2 text-right font-medium">Horiz. asym. ({dt})</th>
                <th scope="col" className="py-1 pr-2 font-medium">ISO 7730</th>
                <th scope="col" className="py-1 font-medium">ASHRAE 55</th>
              </tr>
            </thead>
            <tbody>
              {seatRows.map((r) => (
                <tr key={r.id} className="border-t border-line/70 align-top">
                  <th scope="row" className="py-0.5 pr-2 text-left font-medium whitespace-nowrap">{r.label}</th>
                  <td className="py-0.5 pr-2">{r.zoneNames}</td>
                  <td className="py-0.5 pr-2 text-right font-mono">{pmvText(r.pmv)}</td>
                  <td className="py-0.5 pr-2 text-right font-mono">{num(null, r.ppd, system, 1)}</td>
                  <td className="py-0.5 pr-2 text-right font-mono">{num("temperature", r.mrtC, system)}</td>
                  <td className="py-0.5 pr-2 text-right font-mono">{num("temperature", r.operativeC, system)}</td>
                  <td className="py-0.5 pr-2 text-right font-mono">{num("temperatureDifference", r.verticalAsymmetryC, system)}</td>
                  <td className="py-0.5 pr-2 text-right font-mono">{num("temperatureDifference", r.horizontalAsymmetryC, system)}</td>
                  <td className="py-0.5 pr-2">{r.category ?? "outside C"}</td>
                  <td className="py-0.5 text-xs">{r.ashrae55 ? "✓" : `✗ ${r.ashraeFailing.join("; ")}`}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </Section>

      <Section title="4. Panels" breakBefore>
        <PanelsTable panels={result.panels} system={system} roomName={roomName} />
      </Section>

      <Section title="5. Methods and standards" breakBefore>
        <ol className="list-decimal space-y-3 pl-5 text-sm">
          {METHODS.map((m) => (
            <li key={m.topic} className="keep-together">
              <p>
                <strong>{m.topic}.</strong> {m.text}
              </p>
              <ul className="mt-1 list-disc pl-5 text-muted">
                {m.sources.map((s) => (
                  <li key={s}>{s}</li>
                ))}
              </ul>
            </li>
          ))}
        </ol>
        <h3 className="font-medium">Simplifications of the model</h3>
        <ul className="list-disc pl-5 text-sm">
          {SIMPLIFICATIONS.map((s) => (
            <li key={s}>{s}</li>
          ))}
        </ul>
      </Section>

      <Section title="6. Cautions">
        <ul className="list-disc space-y-2 pl-5 text-sm">
          <li>
            <strong>Design estimate.</strong> {DESIGN_ESTIMATE_CAUTION}
          </li>
          {SAFETY_CAUTIONS.map((s) => (
            <li key={s}>{s}</li>
          ))}
        </ul>
      </Section>
    </article>
  );
}
