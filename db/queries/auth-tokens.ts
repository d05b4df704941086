import { and, eq, gt } from "drizzle-orm";
import { db } from "@/db/client";
import { verifications } from "@/db/schema";
import { storedIdentifier } from "@/lib/auth/verification-id";

/** Whether a set-password token (invitation or reset) still exists and has not expired. */
export async function isSetPasswordTokenUsable({ token, now = new Date() }: { token: string; now?: Date }): Promise<boolean> {
  const rows = await db
    .select({ id: verifications.id })
    .from(verifications)
    .where(and(eq(verifications.identifier, storedIdentifier(`reset-password:${token}`)), gt(verifications.expiresAt, now)))
    .limit(1);
  return rows.length > 0;
}
