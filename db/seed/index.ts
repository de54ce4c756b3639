// Seeds the demo scenario. Idempotent: a second run keeps what users entered and adds nothing twice.
import { pool } from '@/db/client';
import { DEMO_AREAS, DEMO_PASSWORD, DEMO_SITE, DEMO_USERS } from './demo-site';
import { ensureArea, ensureSite, ensureUser } from './ensure-site';
import { seedEditions } from './editions';
import { seedBenchEntries } from './bench';
import { seedDemoSheets } from './sheets';
import { seedDemoConflict } from '@/db/access/sync-demo-conflict';

try {
  const site = await ensureSite(DEMO_SITE.code, DEMO_SITE.name);
  for (const area of DEMO_AREAS) await ensureArea(site.id, area);
  let created = 0;
  for (const u of DEMO_USERS) if ((await ensureUser(site.id, { ...u, password: DEMO_PASSWORD })).created) created++;
  console.log(`demo site ${site.created ? 'created' : 'already present'}; ${created} new demo accounts`);
  console.log(`reference editions ${(await seedEditions(site.id)).created ? 'seeded (No. 1 retired, No. 2 in force)' : 'already present: left as they are'}`);
  console.log(`demo bench entries: ${await seedBenchEntries(site.id)} added`);
  console.log(`demo sheets: ${await seedDemoSheets(site.id)} added`);
  console.log(`demo conflict for the supervisor: ${(await seedDemoConflict(site.id)) ? 'added' : 'already present'}`);
} catch (error) {
  console.error('seeding failed:', error);
  process.exitCode = 1;
} finally {
  await pool().end();
}
