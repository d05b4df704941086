import { SkeletonFilters, SkeletonHeader, SkeletonPage, SkeletonPanel, SkeletonTable } from "@/components/ui/skeleton";

export default function ControllersLoading() {
  return (
    <SkeletonPage label="Loading the controllers…">
      <SkeletonHeader />
      <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_22rem]">
        <div>
          <SkeletonFilters count={3} />
          <SkeletonTable rows={8} columns={6} />
        </div>
        <div className="space-y-6">
          <SkeletonPanel lines={4} fields />
          <SkeletonPanel lines={2} fields />
        </div>
      </div>
    </SkeletonPage>
  );
}
