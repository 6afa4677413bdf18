import type { AppContext } from '../app-context';
import { hashSecret } from '../lib/secret-hashing';
import { LabSettingsModel } from '../models/lab-settings.model';
import { forgetLabSettings } from '../services/settings.service';
import { UserModel } from '../models/user.model';
import { recordAudit } from '../services/audit.service';
import { DEMO_PASSWORD, DEMO_PEOPLE, DEMO_SETTINGS } from './demo-people';
import { seedDemoMaterials } from './seed-demo-materials';
import { seedDemoRecipes } from './seed-demo-recipes';
import { seedDemoRuns } from './seed-demo-runs';

/**
 * Seeds the fictional demo lab into an empty database. Runs at every `npm start` and does
 * nothing once people exist, so a lab's own data is never touched.
 */
export async function seedDemoLab(ctx: AppContext): Promise<{ seeded: boolean }> {
  if ((await UserModel.count()) > 0) return { seeded: false };
  const passwordHash = await hashSecret(DEMO_PASSWORD);
  const pins = new Map(
    await Promise.all(DEMO_PEOPLE.filter((p) => p.pin).map(async (p) => [p.email, await hashSecret(p.pin as string)] as const)),
  );
  await ctx.sequelize.transaction(async (transaction) => {
    for (const person of DEMO_PEOPLE) {
      const user = await UserModel.create(
        { email: person.email, name: person.name, role: person.role, status: 'active', passwordHash, pinHash: pins.get(person.email) ?? null },
        { transaction },
      );
      await recordAudit(ctx, { actorId: null, action: 'seed.user', entityType: 'user', entityId: user.id, after: { email: user.email, role: user.role } }, transaction);
    }
    await LabSettingsModel.upsert({ id: 1, ...DEMO_SETTINGS, updatedAt: ctx.clock.now() }, { transaction });
    forgetLabSettings(transaction);
    await seedDemoMaterials(ctx, transaction);
    await seedDemoRecipes(ctx, transaction);
    await seedDemoRuns(ctx, transaction);
  });
  return { seeded: true };
}
