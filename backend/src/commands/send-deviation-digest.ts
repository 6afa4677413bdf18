/**
 * Sends the daily digest of deviations not yet closed to every active quality person, then exits.
 * Run it once a day (cron, a systemd timer) with the server's own settings in the environment:
 *   npx tsx backend/src/commands/send-deviation-digest.ts
 * Exit code 0 when sent or when nothing is open; 1 when the database or mail server failed.
 */
import { closeAppContext, createAppContext } from '../bootstrap';
import { loadEnv } from '../config/env';
import { sendDeviationDigest } from '../services/deviation-digest.service';

async function main() {
  const ctx = createAppContext(loadEnv());
  try {
    const result = await sendDeviationDigest(ctx, null);
    const what = result.sent ? `sent to ${result.recipients} quality ${result.recipients === 1 ? 'person' : 'people'}` : 'not sent (nothing open, or nobody in quality)';
    console.log(`[digest] ${result.openDeviations} deviation(s) not closed; digest ${what}.`);
  } finally {
    await closeAppContext(ctx);
  }
}

main().catch((error: unknown) => {
  console.error(`[digest] ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
