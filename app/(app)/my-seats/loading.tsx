import { Skeleton, SkeletonRows } from "@/components/ui/skeleton";

export default function MySeatsLoading() {
  return (
    <div className="space-y-6">
      <Skeleton className="h-8 w-36" />
      <SkeletonRows rows={2} label="Loading your seats…" />
    </div>
  );
}
