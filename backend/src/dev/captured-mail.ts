import { mkdir, readdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';

import { CapturedMailSchema, type CapturedMail } from '@tracewright/shared';

/** One JSON file per caught mail; names sort by arrival. */
export async function saveCapturedMail(dir: string, mail: CapturedMail): Promise<void> {
  await mkdir(dir, { recursive: true });
  await writeFile(join(dir, `${mail.id}.json`), JSON.stringify(mail, null, 2));
}

export async function listCapturedMails(dir: string, limit = 200): Promise<CapturedMail[]> {
  let names: string[];
  try {
    names = (await readdir(dir)).filter((n) => n.endsWith('.json'));
  } catch {
    return [];
  }
  names.sort().reverse();
  const mails = await Promise.all(
    names.slice(0, limit).map(async (name) => CapturedMailSchema.safeParse(JSON.parse(await readFile(join(dir, name), 'utf8')))),
  );
  return mails.flatMap((m) => (m.success ? [m.data] : []));
}
