import { SkeletonHeader, SkeletonPage, SkeletonTable } from "@/components/ui/skeleton";

export default function ReleasesLoading() {
  return (
    <SkeletonPage label="Loading the releases…">
      <SkeletonHeader />
      <SkeletonTable rows={5} columns={6} />
    </SkeletonPage>
  );
}
