"use client";

import { memo, useCallback, type Dispatch } from "react";
import { ProductPicker } from "@/components/catalogue/product-picker";
import { ZoneScheduleEditor } from "@/components/louvers/zone-schedule-editor";
import { OpeningProperties, PanelProperties, RoomProperties, SeatProperties, ZoneProperties } from "@/components/plan/element-forms";
import { applyProductToPanel } from "@/lib/catalogue/apply";
import type { Layout } from "@/lib/layout/schema";
import type { EditorAction } from "@/lib/plan/editor";
import { findElement, polygonArea, type AnyElement } from "@/lib/plan/geometry";
import { formatQuantity, type UnitSystem } from "@/lib/units";

interface Props {
  layout: Layout;
  selection: readonly string[];
  units: UnitSystem;
  readOnly: boolean;
  dispatch: Dispatch<EditorAction>;
}

/** The validated form of the selected element; Apply records one undo entry. */
export const PropertiesPanel = memo(function PropertiesPanel({ layout, selection, units, readOnly, dispatch }: Props) {
  const apply = useCallback((item: AnyElement) => dispatch({ type: "replace", items: [item] }), [dispatch]);
  if (selection.length === 0) return <p className="text-sm text-muted">Select an element on the plan or in the list to see its properties.</p>;
  if (selection.length > 1) return <p className="text-sm">{selection.length} elements selected. Drag one to move them all; Delete or Ctrl/Cmd+D act on all of them.</p>;
  const item = findElement(layout, selection[0]!);
  if (!item) return null;
  const common = { units, readOnly };
  switch (item.kind) {
    case "room":
      return (
        <div className="space-y-2">
          <p className="text-xs text-muted">
            {item.element.outline.length} corners · floor area {formatQuantity("area", polygonArea(item.element.outline), units)}
          </p>
          <RoomProperties key={item.element.id} element={item.element} {...common} onApply={(element) => apply({ kind: "room", element })} />
        </div>
      );
    case "opening":
      return (
        <OpeningProperties
          key={item.element.id}
          element={item.element}
          room={layout.rooms.find((r) => r.id === item.element.roomId)}
          {...common}
          onApply={(element) => apply({ kind: "opening", element })}
        />
      );
    case "panel":
      return (
        <div className="space-y-2">
          <p className="text-xs text-muted">In {layout.rooms.find((r) => r.id === item.element.roomId)?.name ?? "no room"}</p>
          <ProductPicker
            value={item.element.productId}
            disabled={readOnly}
            onSelect={(product) =>
              apply({ kind: "panel", element: product ? applyProductToPanel(item.element, product) : { ...item.element, productId: null } })
            }
          />
          <PanelProperties key={item.element.id} element={item.element} {...common} onApply={(element) => apply({ kind: "panel", element })} />
        </div>
      );
    case "seat":
      return <SeatProperties key={item.element.id} element={item.element} {...common} onApply={(element) => apply({ kind: "seat", element })} />;
    case "zone": {
      const zone = item.element;
      // The properties form covers name and target; the schedule has its own form below.
      return (
        <div className="space-y-3">
          <ZoneProperties
            key={zone.id}
            element={zone}
            {...common}
            onApply={(element) => apply({ kind: "zone", element })}
          />
          <ZoneScheduleEditor
            key={`${zone.id}-schedule`}
            zoneName={zone.name}
            schedule={zone.schedule}
            readOnly={readOnly}
            onApply={(schedule) => {
              const { schedule: _previous, ...rest } = zone;
              apply({ kind: "zone", element: schedule ? { ...rest, schedule } : rest });
            }}
          />
        </div>
      );
    }
  }
});
