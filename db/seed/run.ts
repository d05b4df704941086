import { db } from "@/db/client";
import { doorModels, sites } from "@/db/schema";
import { syncSchemaCatalog } from "@/db/queries/profiles";
import { findUserByEmail } from "@/db/queries/users";
import { getAuth } from "@/lib/auth/auth";
import { demoDoorModels, demoSites, demoUsers } from "./demo";
import { seedDemoControllers } from "./controllers";
import { seedDemoProfiles } from "./profiles";

/** Writes the demo scenario; safe to run again (existing rows are updated, existing users kept). */
export async function seedDemo(log: (line: string) => void = () => {}) {
  const auth = getAuth();
  await syncSchemaCatalog();
  for (const u of demoUsers) {
    if (await findUserByEmail({ email: u.email })) continue;
    // Seed only: no headers, so better-auth skips its admin check for the very first admin.
    await auth.api.createUser({ body: { email: u.email, name: u.name, role: u.role, password: u.password } });
    log(`created ${u.role} ${u.email}`);
  }
  for (const s of demoSites) {
    await db.insert(sites).values(s).onDuplicateKeyUpdate({ set: { name: s.name, latitude: s.latitude, longitude: s.longitude, timeZone: s.timeZone } });
  }
  for (const m of demoDoorModels) {
    const { code, ...rest } = m;
    await db.insert(doorModels).values(m).onDuplicateKeyUpdate({ set: rest });
  }
  log(`${demoSites.length} sites and ${demoDoorModels.length} door models in place`);
  await seedDemoProfiles(log);
  await seedDemoControllers(log);
}
