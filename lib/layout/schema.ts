/**
 * The layout document: one JSON value per revision, plain serialisable records in metres
 * (plan coordinates: x east, y north, z up from the finished floor). Everything a comfort
 * computation needs about geometry and equipment lives here; operational data (who sits where,
 * feedback) lives in its own tables so it can change without a new revision.
 */
import { z } from "zod";
import { zoneScheduleSchema } from "@/lib/energy/schedule-schema";

export const LAYOUT_SCHEMA_VERSION = 1 as const;

/** Ids are chosen by the client (stable across revisions); short, URL-safe. */
export const elementId = z
  .string()
  .min(1)
  .max(64)
  .regex(/^[A-Za-z0-9_-]+$/, "use letters, digits, '-' and '_' only");

const finite = z.number().finite();
const label = z.string().trim().min(1).max(80);

/** A point in plan, metres. */
export const planPoint = z.strictObject({ x: finite.min(-1000).max(1000), y: finite.min(-1000).max(1000) });
export type PlanPoint = z.infer<typeof planPoint>;

export const room = z.strictObject({
  id: elementId,
  name: label,
  /** Outline corners in order (either winding), metres. */
  outline: z.array(planPoint).min(3).max(64),
  /** Floor to ceiling, m. */
  ceilingHeightM: finite.min(2).max(20),
});

/** How an opening's (or surface's) inside temperature is known: measured/assumed, or from its U-value. */
export const surfaceThermal = z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("surfaceTemperature"), surfaceTemperatureC: finite.min(-30).max(80) }),
  z.strictObject({ kind: z.literal("uValue"), uValueWm2K: finite.min(0.05).max(10) }),
]);

export const opening = z.strictObject({
  id: elementId,
  roomId: elementId,
  kind: z.enum(["window", "glazedDoor"]),
  /** Index of the room edge from outline[i] to outline[i+1]. */
  edgeIndex: z.int().min(0).max(63),
  /** Distance along the edge from its start corner to the opening's near side, m. */
  offsetM: finite.min(0).max(1000),
  widthM: finite.min(0.1).max(100),
  sillHeightM: finite.min(0).max(19),
  heightM: finite.min(0.1).max(20),
  thermal: surfaceThermal,
});

export const louver = z
  .strictObject({
    /** Full opening angle of the V-groove cavities, degrees; 180 = flat (fully open). */
    openingAngleDeg: finite.min(0).max(180),
    /** Least and greatest opening angle the louver mechanism allows, degrees. */
    minOpeningAngleDeg: finite.min(0).max(180),
    maxOpeningAngleDeg: finite.min(0).max(180),
    /** Plan direction of the groove axis, degrees from +x toward +y. */
    axisDeg: finite.min(-360).max(360),
    /** Reflection of the cavity walls. */
    finish: z.enum(["diffuse", "specular"]),
    /** Emissivity of the cavity walls (0–1]. */
    wallEmissivity: finite.min(0.02).max(1),
  })
  .refine((l) => l.minOpeningAngleDeg <= l.maxOpeningAngleDeg, {
    message: "minOpeningAngleDeg must not exceed maxOpeningAngleDeg",
    path: ["minOpeningAngleDeg"],
  })
  .refine((l) => l.openingAngleDeg >= l.minOpeningAngleDeg && l.openingAngleDeg <= l.maxOpeningAngleDeg, {
    message: "openingAngleDeg must lie within the louver's range",
    path: ["openingAngleDeg"],
  });

/** What sets a panel's surface temperature. */
export const panelSupply = z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("surface"), surfaceTemperatureC: finite.min(5).max(95) }),
  z.strictObject({
    kind: z.literal("water"),
    meanWaterTemperatureC: finite.min(5).max(95),
    /** Product characteristic Q = K·ΔTⁿ per m² of panel: K in W/(m²·Kⁿ), n dimensionless. */
    characteristic: z.strictObject({ kWm2PerKn: finite.positive().max(100), n: finite.min(0.8).max(2) }),
  }),
]);

export const panel = z.strictObject({
  id: elementId,
  label,
  roomId: elementId,
  mounting: z.enum(["ceiling", "wall"]),
  /** Plan position of the panel centre, m (a wall panel's centre lies on its wall line). */
  center: planPoint,
  /**
   * Ceiling panel: plan rotation of its length axis, degrees from +x.
   * Wall panel: plan direction the face points into the room, degrees from +x.
   */
  rotationDeg: finite.min(-360).max(360),
  /** Ceiling panel: across its length axis; wall panel: vertical size. m. */
  widthM: finite.min(0.1).max(50),
  /** Ceiling panel: along its length axis; wall panel: horizontal size along the wall. m. */
  lengthM: finite.min(0.1).max(50),
  /** Ceiling panel: height of its face (null = the room's ceiling height); wall panel: height of its lower edge. m. */
  mountingHeightM: finite.min(0).max(20).nullable(),
  mode: z.enum(["heating", "cooling"]),
  supply: panelSupply,
  /** Hemispherical emissivity of the flat panel face. */
  emissivity: finite.min(0.05).max(1),
  louver: louver.nullable(),
  /** Catalogue product the panel was taken from, if any. */
  productId: z.string().max(64).nullable(),
});

export const seat = z.strictObject({
  id: elementId,
  label,
  position: planPoint,
  posture: z.enum(["seated", "standing"]),
  /** Plan direction the occupant faces, degrees from +x toward +y. */
  facingDeg: finite.min(-360).max(360),
  /** Clothing insulation, clo; null = the scenario's default. */
  clo: finite.min(0).max(2).nullable(),
  /** Metabolic rate, met; null = the scenario's default. */
  met: finite.min(0.8).max(4).nullable(),
});

export const zoneTarget = z.discriminatedUnion("kind", [
  z
    .strictObject({ kind: z.literal("pmvBand"), minPmv: finite.min(-3).max(3), maxPmv: finite.min(-3).max(3) })
    .refine((t) => t.minPmv < t.maxPmv, { message: "minPmv must be below maxPmv", path: ["minPmv"] }),
  z.strictObject({ kind: z.literal("category"), category: z.enum(["A", "B", "C"]) }),
]);

export const zone = z.strictObject({
  id: elementId,
  name: label,
  outline: z.array(planPoint).min(3).max(64),
  target: zoneTarget,
  /**
   * Weekday occupancy periods, each with a louver setting (a fixed opening angle or "automatic"),
   * for the energy figures (GET /api/projects/{id}/energy). Optional: absent = no schedule
   * (layouts saved before schedules existed stay valid at schemaVersion 1).
   */
  schedule: zoneScheduleSchema.optional(),
});

export const underlay = z.strictObject({
  /** Id of an uploaded image (see lib/storage). */
  imageId: z.string().min(1).max(64),
  /** Plan metres per image pixel. */
  metresPerPixel: finite.positive().max(10),
  /** Plan position of the image's top-left corner, m. */
  origin: planPoint,
  opacity: finite.min(0).max(1),
  visible: z.boolean(),
});

const layoutShape = z.strictObject({
  schemaVersion: z.literal(LAYOUT_SCHEMA_VERSION),
  rooms: z.array(room).max(200),
  openings: z.array(opening).max(1000),
  panels: z.array(panel).max(1000),
  seats: z.array(seat).max(2000),
  zones: z.array(zone).max(200),
  underlay: underlay.nullable(),
});

/** Cross-references: ids unique across all elements, rooms referred to exist, edges exist. */
export const layoutSchema = layoutShape.superRefine((layout, ctx) => {
  const seen = new Set<string>();
  const groups = [["rooms", layout.rooms], ["openings", layout.openings], ["panels", layout.panels], ["seats", layout.seats], ["zones", layout.zones]] as const;
  for (const [key, items] of groups) {
    items.forEach((item, index) => {
      if (seen.has(item.id)) {
        ctx.addIssue({ code: "custom", path: [key, index, "id"], message: `duplicate id "${item.id}"` });
      }
      seen.add(item.id);
    });
  }
  const rooms = new Map(layout.rooms.map((r) => [r.id, r]));
  layout.openings.forEach((o, index) => {
    const r = rooms.get(o.roomId);
    if (!r) ctx.addIssue({ code: "custom", path: ["openings", index, "roomId"], message: `no room "${o.roomId}"` });
    else if (o.edgeIndex >= r.outline.length)
      ctx.addIssue({ code: "custom", path: ["openings", index, "edgeIndex"], message: `room "${r.id}" has ${r.outline.length} edges` });
  });
  layout.panels.forEach((p, index) => {
    if (!rooms.has(p.roomId)) ctx.addIssue({ code: "custom", path: ["panels", index, "roomId"], message: `no room "${p.roomId}"` });
  });
});

export type Layout = z.infer<typeof layoutSchema>;
export type Room = z.infer<typeof room>;
export type Opening = z.infer<typeof opening>;
export type Panel = z.infer<typeof panel>;
export type Seat = z.infer<typeof seat>;
export type Zone = z.infer<typeof zone>;
export type ZoneTarget = z.infer<typeof zoneTarget>;

export function emptyLayout(): Layout {
  return { schemaVersion: LAYOUT_SCHEMA_VERSION, rooms: [], openings: [], panels: [], seats: [], zones: [], underlay: null };
}
