/** Human names for the dotted paths of layout validation errors (the API's 400 `fields`). */
import type { Layout } from "@/lib/layout/schema";

/** "layout.panels.2.widthM" → "Panel “P-3” · widthM". */
export function describeLayoutPath(layout: Layout, path: string): string {
  const parts = path.split(".");
  if (parts[0] === "layout") parts.shift();
  const [group, index, ...rest] = parts;
  const names: Record<string, [string, (i: number) => string | undefined]> = {
    rooms: ["Room", (i) => layout.rooms[i]?.name],
    openings: ["Opening", (i) => layout.openings[i]?.id],
    panels: ["Panel", (i) => layout.panels[i]?.label],
    seats: ["Seat", (i) => layout.seats[i]?.label],
    zones: ["Zone", (i) => layout.zones[i]?.name],
  };
  const entry = group ? names[group] : undefined;
  if (!entry || index === undefined) return path;
  const name = entry[1](Number(index));
  return `${entry[0]} “${name ?? `#${Number(index) + 1}`}”${rest.length ? ` · ${rest.join(".")}` : ""}`;
}

