/**
 * Shared types of the panel functions.
 */

/** Surface the panel is mounted in. */
export type PanelOrientation = "ceiling" | "wall" | "floor";

/**
 * Operating mode. Outputs are reported as positive heat delivered to the room in
 * "heating" and as positive cooling capacity (heat removed from the room) in "cooling";
 * a negative value means the surface works against the chosen mode.
 */
export type PanelMode = "heating" | "cooling";
