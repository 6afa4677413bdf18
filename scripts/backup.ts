/** `npm run backup`: the demo/production instance's database and files into .data/backups/<date>/. */
import { join } from 'node:path';

import { backupTo } from './lib/backup';
import { openLocalInstance } from './lib/local-instance';
import { DATA_DIR } from './lib/paths';

async function main() {
  const stamp = new Date().toISOString().replace(/:/g, '').replace(/\..*/, 'Z');
  const folder = process.argv[2] ?? join(DATA_DIR, 'backups', stamp);
  const local = await openLocalInstance();
  try {
    const manifest = await backupTo(folder, local.target);
    console.log(`Backup written to ${folder}: database "${manifest.database}" and ${manifest.objects.length} stored files.`);
  } finally {
    await local.close();
  }
}

main().catch((error: unknown) => {
  console.error(`Backup failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
