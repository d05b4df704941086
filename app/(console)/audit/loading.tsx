import { SkeletonFilters, SkeletonHeader, SkeletonPage, SkeletonTable } from "@/components/ui/skeleton";

export default function AuditLoading() {
  return (
    <SkeletonPage label="Loading the audit log…">
      <SkeletonHeader />
      <SkeletonFilters count={4} />
      <SkeletonTable rows={10} columns={5} />
    </SkeletonPage>
  );
}
