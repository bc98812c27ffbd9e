"use client";

import { useMutation } from "@tanstack/react-query";
import { useState, type Dispatch } from "react";
import { uploadUnderlay } from "@/components/plan/queries";
import { apiErrorMessage } from "@/components/ui/api-errors";
import type { Layout, PlanPoint } from "@/lib/layout/schema";
import type { EditorAction } from "@/lib/plan/editor";
import { distance } from "@/lib/plan/geometry";
import { startTool } from "@/lib/plan/tools";
import { calibrateUnderlay, newUnderlay } from "@/lib/plan/underlay";
import { fromDisplay, toDisplay, unitSymbol, type UnitSystem } from "@/lib/units";

interface Props {
  projectId: string;
  underlay: Layout["underlay"];
  calibration: { a: PlanPoint; b: PlanPoint } | null;
  units: UnitSystem;
  dispatch: Dispatch<EditorAction>;
}

/** Upload a floor-plan image (PNG or JPEG), set its scale from two points, dim or hide it. */
export function UnderlayControls({ projectId, underlay, calibration, units, dispatch }: Props) {
  const upload = useMutation({
    mutationFn: (file: File) => uploadUnderlay(projectId, file),
    onSuccess: (image) => dispatch({ type: "setUnderlay", underlay: newUnderlay(image.imageId) }),
  });
  const [opacity, setOpacity] = useState<number | null>(null);
  const [distanceText, setDistanceText] = useState("");
  const [distanceError, setDistanceError] = useState<string | null>(null);
  const commitOpacity = () => {
    if (underlay && opacity !== null && opacity !== underlay.opacity) dispatch({ type: "setUnderlay", underlay: { ...underlay, opacity } });
    setOpacity(null);
  };
  const lengthUnit = unitSymbol("length", units);

  return (
    <div className="space-y-2 text-sm">
      <label className="block space-y-1">
        <span className="font-medium">Floor-plan image (PNG or JPEG)</span>
        <input
          type="file"
          accept="image/png,image/jpeg"
          className="block w-full text-xs"
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file) upload.mutate(file);
            e.target.value = "";
          }}
        />
      </label>
      {upload.isPending ? <p className="text-xs text-muted">Uploading…</p> : null}
      <p aria-live="polite" className="text-xs text-danger">
        {upload.isError ? apiErrorMessage(upload.error) : null}
      </p>
      {underlay ? (
        <>
          <label className="flex items-center gap-2">
            <input type="checkbox" checked={underlay.visible} onChange={(e) => dispatch({ type: "setUnderlay", underlay: { ...underlay, visible: e.target.checked } })} />
            Show underlay
          </label>
          <label className="block space-y-1">
            <span>Underlay opacity</span>
            <input
              type="range"
              min={0.05}
              max={1}
              step={0.05}
              value={opacity ?? underlay.opacity}
              onChange={(e) => setOpacity(Number(e.target.value))}
              onPointerUp={commitOpacity}
              onKeyUp={commitOpacity}
              onBlur={commitOpacity}
              className="w-full"
            />
          </label>
          <p className="text-xs text-muted">
            Scale: {toDisplay("length", underlay.metresPerPixel * 100, units).toFixed(3)} {lengthUnit} per 100 px
          </p>
          {calibration ? (
            <form
              noValidate
              className="space-y-1 rounded-md border border-line p-2"
              onSubmit={(e) => {
                e.preventDefault();
                const value = Number(distanceText);
                if (distanceText.trim() === "" || !Number.isFinite(value) || value <= 0) {
                  setDistanceError("Enter the real distance between the two points, greater than 0.");
                  return;
                }
                if (distance(calibration.a, calibration.b) === 0) {
                  setDistanceError("Click two different points.");
                  return;
                }
                dispatch({ type: "setUnderlay", underlay: calibrateUnderlay(underlay, calibration.a, calibration.b, fromDisplay("length", value, units)) });
                dispatch({ type: "cancelCalibration" });
                setDistanceText("");
                setDistanceError(null);
              }}
            >
              <label htmlFor="underlay-distance" className="block text-xs font-medium">
                Real distance between the two points ({lengthUnit})
              </label>
              <input
                id="underlay-distance"
                type="number"
                step="any"
                value={distanceText}
                onChange={(e) => setDistanceText(e.target.value)}
                aria-invalid={distanceError ? true : undefined}
                aria-describedby="underlay-distance-error"
                className="block w-full rounded border border-line px-2 py-1"
              />
              <p id="underlay-distance-error" aria-live="polite" className="text-xs text-danger">
                {distanceError}
              </p>
              <div className="flex gap-2">
                <button type="submit" className="rounded bg-accent px-2 py-1 text-xs font-medium text-white">
                  Set scale
                </button>
                <button type="button" className="text-xs underline" onClick={() => dispatch({ type: "cancelCalibration" })}>
                  Cancel
                </button>
              </div>
            </form>
          ) : (
            <button type="button" className="rounded border border-line px-2 py-1 text-xs hover:border-accent" onClick={() => dispatch({ type: "setTool", tool: startTool("calibrate") })}>
              Set scale from two points
            </button>
          )}
          <button type="button" className="block text-xs text-danger underline" onClick={() => dispatch({ type: "setUnderlay", underlay: null })}>
            Remove underlay
          </button>
        </>
      ) : null}
    </div>
  );
}
