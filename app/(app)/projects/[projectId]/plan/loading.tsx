import { Skeleton } from "@/components/ui/skeleton";

export default function PlanLoading() {
  return (
    <div role="status" aria-live="polite" className="space-y-3">
      <span className="sr-only">Loading the plan…</span>
      <Skeleton className="h-8 w-72" />
      <Skeleton className="h-9 w-full" />
      <Skeleton className="h-[60vh] w-full" />
    </div>
  );
}
