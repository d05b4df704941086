import { SkeletonHeader, SkeletonPage, SkeletonPanel, SkeletonTable } from "@/components/ui/skeleton";

export default function SitesLoading() {
  return (
    <SkeletonPage label="Loading the sites…">
      <SkeletonHeader />
      <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_22rem]">
        <SkeletonTable rows={5} columns={5} />
        <SkeletonPanel lines={5} fields />
      </div>
    </SkeletonPage>
  );
}
