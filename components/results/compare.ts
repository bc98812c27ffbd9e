/** Per-seat comparison of two computations (two scenarios, or two revisions of one scenario). */
import type { SeatResult } from "@/lib/compute/types";

export interface SeatChange {
  id: string;
  label: string;
  pmvA: number;
  pmvB: number;
  /** pmvB − pmvA. */
  deltaPmv: number;
  operativeA: number;
  operativeB: number;
}

export interface SeatComparison {
  /** Seats present in both, largest |ΔPMV| first (ties by label). */
  changes: SeatChange[];
  /** Seats only in A (removed in B) and only in B (added), by label. */
  onlyA: { id: string; label: string }[];
  onlyB: { id: string; label: string }[];
  meanDeltaPmv: number | null;
}

const collator = new Intl.Collator("en", { numeric: true });

export function compareSeats(a: readonly SeatResult[], b: readonly SeatResult[]): SeatComparison {
  const byIdB = new Map(b.map((s) => [s.id, s]));
  const idsA = new Set(a.map((s) => s.id));
  const changes: SeatChange[] = [];
  for (const sa of a) {
    const sb = byIdB.get(sa.id);
    if (!sb) continue;
    changes.push({
      id: sa.id,
      label: sb.label,
      pmvA: sa.pmv,
      pmvB: sb.pmv,
      deltaPmv: sb.pmv - sa.pmv,
      operativeA: sa.operativeC,
      operativeB: sb.operativeC,
    });
  }
  changes.sort((x, y) => Math.abs(y.deltaPmv) - Math.abs(x.deltaPmv) || collator.compare(x.label, y.label));
  const byLabel = (x: { label: string }, y: { label: string }) => collator.compare(x.label, y.label);
  return {
    changes,
    onlyA: a.filter((s) => !byIdB.has(s.id)).map(({ id, label }) => ({ id, label })).sort(byLabel),
    onlyB: b.filter((s) => !idsA.has(s.id)).map(({ id, label }) => ({ id, label })).sort(byLabel),
    meanDeltaPmv: changes.length > 0 ? changes.reduce((sum, c) => sum + c.deltaPmv, 0) / changes.length : null,
  };
}
