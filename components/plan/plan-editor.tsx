"use client";

/**
 * The plan editor: the editor reducer (lib/plan/editor) owns the layout, selection, tool and
 * history; this component wires it to the canvas, the side panels and the API.
 */
import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useCallback, useEffect, useMemo, useReducer, useRef, useState, type ReactNode } from "react";
import { EditorToolbar } from "@/components/plan/editor-toolbar";
import { ObjectList } from "@/components/plan/object-list";
import type { OverlayMode } from "@/components/plan/overlay-shapes";
import { PlanCanvas, type PlanCanvasHandle } from "@/components/plan/plan-canvas";
import { PropertiesPanel } from "@/components/plan/properties-panel";
import { underlayUrl } from "@/components/plan/queries";
import { headLayoutQuery, runCompute, type LayoutAtRevision } from "@/components/projects/queries";
import { ResultsPanel, SeatDetail } from "@/components/plan/results-panel";
import { RevisionsPanel } from "@/components/plan/revisions-panel";
import { SaveDialog } from "@/components/plan/save-dialog";
import { UnderlayControls } from "@/components/plan/underlay-controls";
import { Button } from "@/components/ui/button";
import type { Layout } from "@/lib/layout/schema";
import { createEditorReducer, currentLayout, initialEditorState, isDirty } from "@/lib/plan/editor";
import { findElement } from "@/lib/plan/geometry";
import { canRedo, canUndo } from "@/lib/plan/history";
import type { UnitSystem } from "@/lib/units";

export interface PlanEditorProps {
  projectId: string;
  projectName: string;
  initial: { layout: Layout; revision: number };
  units: UnitSystem;
  readOnly: boolean;
  canCompute: boolean;
}

function isTyping(target: EventTarget | null): boolean {
  return target instanceof HTMLInputElement || target instanceof HTMLTextAreaElement || target instanceof HTMLSelectElement || (target instanceof HTMLElement && target.isContentEditable);
}

function Section({ title, children, defaultOpen = true }: { title: string; children: ReactNode; defaultOpen?: boolean }) {
  return (
    <details open={defaultOpen} className="rounded-md border border-line bg-white">
      <summary className="cursor-pointer select-none px-3 py-2 text-sm font-semibold">{title}</summary>
      <div className="border-t border-line px-3 py-3">{children}</div>
    </details>
  );
}

export function PlanEditor({ projectId, projectName, initial, units, readOnly, canCompute }: PlanEditorProps) {
  const reducer = useMemo(() => createEditorReducer(), []);
  const [state, dispatch] = useReducer(reducer, undefined, () => initialEditorState(initial.layout, initial.revision, readOnly));
  const layout = currentLayout(state);
  const dirty = isDirty(state);
  const canvas = useRef<PlanCanvasHandle>(null);
  const queryClient = useQueryClient();
  const [saving, setSaving] = useState(false);
  const [savedNote, setSavedNote] = useState<string | null>(null);

  // --- keyboard shortcuts (not while typing in a form) ---
  const toolKind = state.tool.kind;
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (isTyping(e.target) || saving) return;
      const mod = e.ctrlKey || e.metaKey;
      const key = e.key.toLowerCase();
      const toolKey = (k: string) => dispatch({ type: "tool", event: { type: "key", key: k }, options: { closeRadiusM: 0, bandThresholdM: 0 } });
      if (mod && key === "z") {
        e.preventDefault();
        dispatch({ type: e.shiftKey ? "redo" : "undo" });
      } else if (mod && key === "y") {
        e.preventDefault();
        dispatch({ type: "redo" });
      } else if (mod && key === "d") {
        e.preventDefault();
        dispatch({ type: "duplicate" });
      } else if (e.key === "Delete" || e.key === "Backspace") {
        e.preventDefault();
        if (toolKind === "draw") toolKey("Backspace");
        else dispatch({ type: "delete" });
      } else if (e.key === "Enter" || e.key === "Escape") {
        toolKey(e.key);
        if (e.key === "Escape" && toolKind !== "select") dispatch({ type: "setTool", tool: { kind: "select", gesture: { phase: "idle" } } });
      }
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [toolKind, saving]);

  // --- a warning before leaving with unsaved changes ---
  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      e.returnValue = "";
    };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty]);

  // --- underlay image ---
  const imageId = layout.underlay?.imageId ?? null;
  const [underlayImage, setUnderlayImage] = useState<HTMLImageElement | null>(null);
  useEffect(() => {
    if (!imageId) return;
    const img = new window.Image();
    img.onload = () => setUnderlayImage(img);
    img.src = underlayUrl(projectId, imageId);
    return () => {
      img.onload = null;
      setUnderlayImage(null);
    };
  }, [projectId, imageId]);

  // --- results ---
  const [scenarioId, setScenarioId] = useState("");
  const [overlay, setOverlay] = useState<{ visible: boolean; mode: OverlayMode }>({ visible: true, mode: "pmv" });
  const compute = useMutation({ mutationFn: (vars: { scenarioId: string; revision: number }) => runCompute(projectId, vars) });
  const result = compute.data ?? null;
  const stale = result !== null && (result.revision !== state.baseRevision || dirty);
  const panelWarnings = useMemo(() => {
    const map = new Map<string, string>();
    for (const p of result?.panels ?? []) {
      if (p.condensation?.risk) map.set(p.id, "Condensation risk");
      else if (p.warnings.length > 0) map.set(p.id, p.warnings.join(" "));
    }
    return map;
  }, [result]);

  const selectedSeat = useMemo(() => {
    if (state.selection.length !== 1 || !result) return null;
    const item = findElement(layout, state.selection[0]!);
    return item?.kind === "seat" ? (result.seats.find((s) => s.id === item.element.id) ?? null) : null;
  }, [state.selection, layout, result]);

  // --- saving, reloading, restoring ---
  const loadHead = useCallback((head: LayoutAtRevision) => {
    dispatch({ type: "load", layout: head.layout, revision: head.revision });
  }, []);
  const reload = useCallback(async () => {
    const head = await queryClient.fetchQuery({ ...headLayoutQuery(projectId), staleTime: 0 });
    loadHead(head);
    setSaving(false);
    setSavedNote(`Loaded revision ${head.revision}.`);
  }, [queryClient, projectId, loadHead]);

  const onScenario = useCallback((id: string) => setScenarioId(id), []);
  const select = useCallback((id: string) => dispatch({ type: "select", ids: [id] }), []);
  const fit = useCallback(() => canvas.current?.fit(), []);

  return (
    <div className="space-y-3" data-testid="plan-editor" data-revision={state.baseRevision} data-dirty={dirty}>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h1 className="text-xl font-semibold">{projectName} · plan</h1>
          <p className="text-sm text-muted" aria-live="polite">
            Revision {state.baseRevision}
            {dirty ? " · unsaved changes" : " · saved"}
            {readOnly ? " · read only (your role cannot edit layouts)" : ""}
            {savedNote ? ` · ${savedNote}` : ""}
          </p>
        </div>
        {readOnly ? null : (
          <Button
            onClick={() => {
              setSavedNote(null);
              setSaving(true);
            }}
            disabled={!dirty}
          >
            Save
          </Button>
        )}
      </div>
      <EditorToolbar
        tool={state.tool}
        grid={state.grid}
        readOnly={readOnly}
        canUndo={canUndo(state.history)}
        canRedo={canRedo(state.history)}
        hasSelection={state.selection.length > 0}
        units={units}
        dispatch={dispatch}
        onFit={fit}
      />
      <div role="status" aria-live="polite" className={state.notice ? "rounded-md border border-warm/40 bg-warm/5 px-3 py-1.5 text-sm text-warm" : "sr-only"}>
        {state.notice}
      </div>
      <div className="grid gap-3 lg:grid-cols-[13rem_minmax(0,1fr)_20rem]">
        <aside className="order-2 max-h-[72vh] overflow-y-auto rounded-md border border-line bg-white p-3 lg:order-1">
          <ObjectList layout={layout} selection={state.selection} dispatch={dispatch} />
        </aside>
        <div className="order-1 h-[72vh] min-h-[420px] overflow-hidden rounded-md border border-line lg:order-2">
          <PlanCanvas
            handle={canvas}
            layout={layout}
            selection={state.selection}
            tool={state.tool}
            grid={state.grid}
            readOnly={readOnly}
            dispatch={dispatch}
            result={result}
            overlay={overlay}
            underlayImage={layout.underlay ? underlayImage : null}
            panelWarnings={panelWarnings}
          />
        </div>
        <aside className="order-3 max-h-[72vh] space-y-3 overflow-y-auto">
          <Section title="Properties">
            <PropertiesPanel layout={layout} selection={state.selection} units={units} readOnly={readOnly} dispatch={dispatch} />
          </Section>
          {selectedSeat ? (
            <Section title="Seat comfort">
              <SeatDetail seat={selectedSeat} units={units} />
            </Section>
          ) : null}
          <Section title="Comfort results">
            <ResultsPanel
              projectId={projectId}
              units={units}
              dirty={dirty}
              canCompute={canCompute}
              scenarioId={scenarioId}
              onScenario={onScenario}
              onCompute={() => compute.mutate({ scenarioId, revision: state.baseRevision })}
              onSaveFirst={() => setSaving(true)}
              pending={compute.isPending}
              error={compute.error}
              result={result}
              stale={stale}
              overlay={overlay}
              onOverlay={setOverlay}
              onSelect={select}
            />
          </Section>
          <Section title="Revisions" defaultOpen={false}>
            <RevisionsPanel
              projectId={projectId}
              baseRevision={state.baseRevision}
              dirty={dirty}
              readOnly={readOnly}
              onRestored={(head) => {
                loadHead(head);
                setSavedNote(`Restored as revision ${head.revision}.`);
              }}
            />
          </Section>
          {readOnly ? null : (
            <Section title="Underlay" defaultOpen={false}>
              <UnderlayControls projectId={projectId} underlay={layout.underlay} calibration={state.calibration} units={units} dispatch={dispatch} />
            </Section>
          )}
        </aside>
      </div>
      {saving ? (
        <SaveDialog
          projectId={projectId}
          layout={layout}
          baseRevision={state.baseRevision}
          onClose={() => setSaving(false)}
          onSaved={(saved, sent) => {
            dispatch({ type: "saved", layout: sent, revision: saved.revision });
            setSaving(false);
            setSavedNote(`Saved as revision ${saved.revision}.`);
          }}
          onReload={reload}
        />
      ) : null}
    </div>
  );
}
