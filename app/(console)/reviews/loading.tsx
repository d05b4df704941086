import { SkeletonHeader, SkeletonPage, SkeletonTable } from "@/components/ui/skeleton";

export default function ReviewsLoading() {
  return (
    <SkeletonPage label="Loading the review queue…">
      <SkeletonHeader />
      <div className="space-y-6">
        <SkeletonTable rows={5} columns={5} />
        <SkeletonTable rows={3} columns={3} />
      </div>
    </SkeletonPage>
  );
}
