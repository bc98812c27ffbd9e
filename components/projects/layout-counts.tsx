import type { Layout } from "@/lib/layout/schema";

/** What the head layout holds, at a glance. */
export function LayoutCounts({ layout }: { layout: Layout }) {
  const counts = [
    { label: "Rooms", value: layout.rooms.length },
    { label: "Panels", value: layout.panels.length },
    { label: "Seats", value: layout.seats.length },
    { label: "Zones", value: layout.zones.length },
  ];
  return (
    <dl className="grid grid-cols-2 gap-3 sm:grid-cols-4">
      {counts.map((c) => (
        <div key={c.label} className="rounded-lg border border-line bg-white px-4 py-3">
          <dt className="text-xs uppercase tracking-wide text-muted">{c.label}</dt>
          <dd className="text-2xl font-semibold tabular-nums">{c.value}</dd>
        </div>
      ))}
    </dl>
  );
}
