import type { Metadata } from "next";
import { StallTool } from "@/components/tools/stall-tool";
import { PageHeader } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";
import { pickTextFields, stallInputSchema } from "@/lib/drive/inputs";

export const metadata: Metadata = { title: "Stall check" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

// Query parameters use the route's names, so a link can open the tool with given values.
export default async function StallToolPage({ searchParams }: Props) {
  await requirePageUser("tools:use");
  const initial = pickTextFields(await searchParams, Object.keys(stallInputSchema.shape));
  return (
    <>
      <PageHeader
        title="Stall check"
        intro="The stall threshold and window from a nominal velocity, the start-up blanking, and how far the door moves before a stall stops it."
      />
      <StallTool initial={initial} />
    </>
  );
}
