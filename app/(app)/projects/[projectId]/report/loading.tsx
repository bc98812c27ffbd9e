import { SkeletonRows } from "@/components/ui/skeleton";

/** The report computes on the server before it renders. */
export default function ReportLoading() {
  return <SkeletonRows rows={6} label="Computing the comfort report…" />;
}
