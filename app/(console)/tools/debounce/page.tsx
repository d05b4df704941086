import type { Metadata } from "next";
import { DebounceTool } from "@/components/tools/debounce-tool";
import { PageHeader } from "@/components/ui/surface";
import { requirePageUser } from "@/lib/auth/guard";
import { pickTextFields, debounceInputSchema } from "@/lib/drive/inputs";

export const metadata: Metadata = { title: "Debounce" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

// Query parameters use the route's names, so a link can open the tool with given values.
export default async function DebounceToolPage({ searchParams }: Props) {
  await requirePageUser("tools:use");
  const initial = pickTextFields(await searchParams, Object.keys(debounceInputSchema.shape));
  return (
    <>
      <PageHeader
        title="Debounce"
        intro="RC and Schmitt-trigger delays for buttons and end-stop contacts, component values for a wanted delay, and software sampling."
      />
      <DebounceTool initial={initial} />
    </>
  );
}
