import type { Metadata } from "next";
import { TravelTool } from "@/components/tools/travel-tool";
import { PageHeader } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";
import { pickTextFields, travelInputSchema } from "@/lib/drive/inputs";

export const metadata: Metadata = { title: "Drive train" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

// Query parameters use the route's names, so a link can open the tool with given values.
export default async function TravelToolPage({ searchParams }: Props) {
  await requirePageUser("tools:use");
  const initial = pickTextFields(await searchParams, Object.keys(travelInputSchema.shape));
  return (
    <>
      <PageHeader
        title="Drive train"
        intro="Encoder counts for a door's travel from spool, cord, gearbox and encoder, with the travel time and door speed at a motor speed."
      />
      <TravelTool initial={initial} />
    </>
  );
}
