/**
 * The demo plan: an invented office floor ("Quayside House, level 3") with an open office along
 * a glazed south façade, a meeting room and a focus room. Invented data, for the demo only.
 */
import type { Weekday } from "@/lib/energy";
import { LAYOUT_SCHEMA_VERSION, type Layout, type Panel, type Seat } from "@/lib/layout/schema";

const CEILING_M = 2.8;
/** Occupancy schedules run Monday to Friday. */
const WORKDAYS: Weekday[] = ["mon", "tue", "wed", "thu", "fri"];

function ceilingPanel(id: string, label: string, roomId: string, x: number, y: number, louvered: boolean, mode: Panel["mode"] = "heating"): Panel {
  return {
    id,
    label,
    roomId,
    mounting: "ceiling",
    center: { x, y },
    rotationDeg: 0,
    widthM: 1.2,
    lengthM: 2.4,
    mountingHeightM: null,
    mode,
    // Heating panels run at 34 °C; the chilled panels at 17 °C, a little above a summer dew point.
    supply: { kind: "surface", surfaceTemperatureC: mode === "heating" ? 34 : 17 },
    emissivity: 0.93,
    louver: louvered
      ? { openingAngleDeg: 180, minOpeningAngleDeg: 30, maxOpeningAngleDeg: 180, axisDeg: 0, finish: "diffuse", wallEmissivity: 0.9 }
      : null,
    productId: null,
  };
}

function desk(id: string, label: string, x: number, y: number, facingDeg: number): Seat {
  return { id, label, position: { x, y }, posture: "seated", facingDeg, clo: null, met: null };
}

export function demoLayout(): Layout {
  const panels: Panel[] = [];
  // Open office: 4 rows × 5 columns of ceiling panels; the two rows nearest the glass are louvered
  // heating panels, the two core rows chilled panels (cooling).
  for (let row = 0; row < 4; row += 1) {
    for (let col = 0; col < 5; col += 1) {
      const n = row * 5 + col + 1;
      panels.push(ceilingPanel(`panel-oo-${n}`, `OO-${String(n).padStart(2, "0")}`, "room-open", 1.8 + col * 3.6, 1.8 + row * 2.9, row < 2, row < 2 ? "heating" : "cooling"));
    }
  }
  panels.push(ceilingPanel("panel-mt-1", "MT-01", "room-meeting", 21, 2, false), ceilingPanel("panel-mt-2", "MT-02", "room-meeting", 21, 4.2, false));
  panels.push(ceilingPanel("panel-fc-1", "FC-01", "room-focus", 21, 9, true));
  panels.push({
    ...ceilingPanel("panel-fc-wall", "FC-W1", "room-focus", 23.95, 9, false),
    mounting: "wall",
    rotationDeg: 180,
    widthM: 0.6,
    lengthM: 1.8,
    mountingHeightM: 0.3,
    supply: { kind: "water", meanWaterTemperatureC: 45, characteristic: { kWm2PerKn: 5.2, n: 1.1 } },
  });

  const seats: Seat[] = [];
  // 5 rows × 8 desks in the open office, facing alternately north and south.
  for (let row = 0; row < 5; row += 1) {
    for (let col = 0; col < 8; col += 1) {
      const n = row * 8 + col + 1;
      seats.push(desk(`seat-oo-${n}`, `Desk ${String.fromCharCode(65 + row)}${col + 1}`, 1.4 + col * 2.15, 1.6 + row * 2.2, row % 2 === 0 ? 90 : -90));
    }
  }
  for (let i = 0; i < 6; i += 1) {
    seats.push(desk(`seat-mt-${i + 1}`, `Meeting ${i + 1}`, i < 3 ? 20 : 22, 1.8 + (i % 3) * 1.2, i < 3 ? 0 : 180));
  }
  seats.push(desk("seat-fc-1", "Focus 1", 20, 8.5, 0), desk("seat-fc-2", "Focus 2", 22, 10.5, 180));

  return {
    schemaVersion: LAYOUT_SCHEMA_VERSION,
    rooms: [
      { id: "room-open", name: "Open office", outline: [{ x: 0, y: 0 }, { x: 18, y: 0 }, { x: 18, y: 12 }, { x: 0, y: 12 }], ceilingHeightM: CEILING_M },
      { id: "room-meeting", name: "Meeting room", outline: [{ x: 18, y: 0 }, { x: 24, y: 0 }, { x: 24, y: 6 }, { x: 18, y: 6 }], ceilingHeightM: CEILING_M },
      { id: "room-focus", name: "Focus room", outline: [{ x: 18, y: 6 }, { x: 24, y: 6 }, { x: 24, y: 12 }, { x: 18, y: 12 }], ceilingHeightM: CEILING_M },
    ],
    openings: [0, 1, 2, 3].map((i) => ({
      id: `win-oo-${i + 1}`,
      roomId: "room-open",
      kind: "window" as const,
      edgeIndex: 0,
      offsetM: 0.5 + i * 4.4,
      widthM: 3.6,
      sillHeightM: 0.8,
      heightM: 1.8,
      thermal: { kind: "uValue" as const, uValueWm2K: 1.4 },
    })).concat([
      { id: "win-mt-1", roomId: "room-meeting", kind: "window", edgeIndex: 0, offsetM: 1, widthM: 4, sillHeightM: 0.8, heightM: 1.8, thermal: { kind: "uValue", uValueWm2K: 1.4 } },
    ]),
    panels,
    seats,
    zones: [
      { id: "zone-window", name: "Window desks", outline: [{ x: 0, y: 0 }, { x: 18, y: 0 }, { x: 18, y: 4 }, { x: 0, y: 4 }], target: { kind: "category", category: "B" }, schedule: { periods: [{ days: WORKDAYS, startHour: 8, endHour: 18, louver: { mode: "automatic" } }] } },
      { id: "zone-core", name: "Core desks", outline: [{ x: 0, y: 4 }, { x: 18, y: 4 }, { x: 18, y: 12 }, { x: 0, y: 12 }], target: { kind: "pmvBand", minPmv: -0.5, maxPmv: 0.5 },
        schedule: {
          periods: [
            { days: WORKDAYS, startHour: 8, endHour: 12, louver: { mode: "fixed", openingAngleDeg: 120 } },
            { days: WORKDAYS, startHour: 13, endHour: 18, louver: { mode: "automatic" } },
          ],
        },
      },
      { id: "zone-meeting", name: "Meeting", outline: [{ x: 18, y: 0 }, { x: 24, y: 0 }, { x: 24, y: 6 }, { x: 18, y: 6 }], target: { kind: "category", category: "B" }, schedule: { periods: [{ days: WORKDAYS, startHour: 9, endHour: 17, louver: { mode: "fixed", openingAngleDeg: 90 } }] } },
    ],
    underlay: null,
  };
}
