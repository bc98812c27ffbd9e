"use client";

import dynamic from "next/dynamic";
import type { PlanEditorProps } from "@/components/plan/plan-editor";

/** Konva needs the browser: the editor is loaded on the client only. */
const PlanEditor = dynamic(() => import("@/components/plan/plan-editor").then((m) => m.PlanEditor), {
  ssr: false,
  loading: () => <p className="py-16 text-center text-sm text-muted">Loading the plan editor…</p>,
});

export function PlanEditorLoader(props: PlanEditorProps) {
  return <PlanEditor {...props} />;
}
