import { SkeletonHeader, SkeletonPage, SkeletonPanel, SkeletonTable } from "@/components/ui/skeleton";

export default function ProfilesLoading() {
  return (
    <SkeletonPage label="Loading the profiles…">
      <SkeletonHeader />
      <div className="grid gap-6 xl:grid-cols-[1fr_24rem]">
        <div className="space-y-6">
          <SkeletonTable rows={4} columns={6} />
          <SkeletonTable rows={6} columns={4} />
        </div>
        <SkeletonPanel lines={4} fields />
      </div>
    </SkeletonPage>
  );
}
