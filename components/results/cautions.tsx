import type { ComputeResult } from "@/lib/compute/types";

/** The standing caution shown with every result, on screen and in the report. */
export const DESIGN_ESTIMATE_CAUTION =
  "These results are a design estimate from a steady-state model. They do not replace licensed engineering judgement or the local codes and standards that apply to the project.";

export const SAFETY_CAUTIONS: readonly string[] = [
  "Hot reachable surfaces: heating panels and their supply pipework within reach of occupants can cause burns, above all for children, older people and anyone who cannot move away. Keep reachable surface temperatures within the limits of the local codes, or guard them.",
  "Condensation on chilled panels: keep every cooling surface above the room's dew point with a margin, and control the supply temperature (or stop cooling) when humidity rises.",
  "Mounting and electrical work: panel suspension, fixing to the structure, and electrical and control connections are work for qualified people under the local codes.",
];

export function StandingCaution({ className = "" }: { className?: string }) {
  return (
    <aside aria-label="Caution" className={`rounded-md border border-warm/40 bg-warm/5 px-4 py-3 text-sm text-ink ${className}`}>
      <p className="font-medium text-warm">Design estimate</p>
      <p>{DESIGN_ESTIMATE_CAUTION}</p>
    </aside>
  );
}

const WARNING_TITLES: Record<string, string> = {
  condensation_risk: "Condensation risk",
  hot_surface: "Hot reachable surface",
};

/**
 * What needs attention in one result: the computation's warnings (condensation risk on chilled
 * panels, hot reachable surfaces, seats outside the model's range…), each with the object it
 * is about. The messages come from the server in SI; the tables beside them show display units.
 */
export function ResultWarnings({ result, roomName }: { result: ComputeResult; roomName?: (id: string) => string }) {
  const panels = new Map(result.panels.map((p) => [p.id, p]));
  if (result.warnings.length === 0) {
    return (
      <p className="text-sm text-muted" role="status">
        No condensation risk, hot reachable surface or other warning in this result.
      </p>
    );
  }
  return (
    <section aria-label="Warnings" className="space-y-2 rounded-md border border-danger/30 bg-danger/5 px-4 py-3 text-sm">
      <h3 className="font-medium text-danger">
        {result.warnings.length} warning{result.warnings.length === 1 ? "" : "s"}
      </h3>
      <ul className="list-disc space-y-1 pl-5">
        {result.warnings.map((w, i) => {
          const panel = w.objectId ? panels.get(w.objectId) : undefined;
          const title = WARNING_TITLES[w.code];
          return (
            <li key={`${w.code}-${w.objectId}-${i}`}>
              {panel ? (
                <strong>
                  Panel {panel.label}
                  {roomName ? ` (${roomName(panel.roomId)})` : ""}
                  {title ? ` — ${title}` : ""}:{" "}
                </strong>
              ) : null}
              {w.message}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
