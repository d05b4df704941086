// Seeds the demo scenario into DATABASE_URL (idempotent).
import "./load-env";
import { closeDb } from "@/db/client";
import { seedDemo } from "@/db/seed/run";
import { settleMailDelivery } from "@/lib/mail/outbox";

seedDemo((line) => console.log(`[roostline] seed: ${line}`))
  .catch((err) => {
    console.error("[roostline] seed failed:", err instanceof Error ? err.message : err);
    process.exitCode = 1;
  })
  .finally(async () => {
    await settleMailDelivery();
    await closeDb();
  });
