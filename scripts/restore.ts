/** `npm run restore -- <folder>`: brings back a backup made by `npm run backup`. */
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';

import { restoreFrom } from './lib/backup';
import { openLocalInstance } from './lib/local-instance';

async function main() {
  const folder = process.argv[2];
  if (!folder || !existsSync(join(resolve(folder), 'manifest.json'))) {
    throw new Error('Name a backup folder (one that holds manifest.json), e.g. npm run restore -- .data/backups/20261202T101500Z');
  }
  const local = await openLocalInstance();
  try {
    const manifest = await restoreFrom(resolve(folder), local.target);
    console.log(`Restored database "${local.target.database}" and ${manifest.objects.length} files from ${folder} (made ${manifest.createdAt}).`);
    console.log('Restart `npm start` so the server reconnects to the restored data.');
  } finally {
    await local.close();
  }
}

main().catch((error: unknown) => {
  console.error(`Restore failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
