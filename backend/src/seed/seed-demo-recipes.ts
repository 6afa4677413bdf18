import type { Model, ModelStatic, Transaction } from 'sequelize';

import { DraftContentSchema, RecipeInputSchema, type DraftContent, type VersionState } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { HeatSourceModel } from '../models/heat-source.model';
import { InkModel } from '../models/ink.model';
import { PrinterModel } from '../models/printer.model';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { RecipeModel } from '../models/recipe.model';
import { SignatureModel } from '../models/signature.model';
import { SubstrateModel } from '../models/substrate.model';
import { SurfaceTreaterModel } from '../models/surface-treater.model';
import { UserModel } from '../models/user.model';
import { recordAudit } from '../services/audit.service';
import { contentHashOf } from '../services/recipe-dto';
import { loadReferences } from '../services/recipe-references';
import { evaluateContent } from '../services/recipe-version-view';
import { DEMO_HEAT_SOURCES, DEMO_PRINTERS, DEMO_SURFACE_TREATERS } from './demo-equipment';
import { DEMO_INKS, DEMO_SUBSTRATES } from './demo-materials';
import { DEMO_PEOPLE } from './demo-people';
import { humidityLabel, lensHeater, touchStripV1, touchStripV2, type DemoIds } from './demo-recipes';

const DAY_MS = 86_400_000;

/** The newest record of that name: the one the seeding transaction has just written. */
async function idByName(model: ModelStatic<Model & { id: number }>, name: string, transaction: Transaction): Promise<number> {
  const row = await model.findOne({ where: { name }, order: [['id', 'DESC']], transaction });
  if (!row) throw new Error(`Demo record “${name}” is missing: seed the materials and equipment first.`);
  return row.id;
}

async function demoIds(transaction: Transaction): Promise<DemoIds> {
  const find = (model: ModelStatic<Model & { id: number }>, name: string) => idByName(model, name, transaction);
  const heat = (kind: string) => DEMO_HEAT_SOURCES.find((h) => h.kind === kind)?.name ?? '';
  const treater = (method: string) => DEMO_SURFACE_TREATERS.find((s) => s.method === method)?.name ?? '';
  return {
    inks: {
      silver: await find(InkModel, DEMO_INKS.silver.name),
      polymer: await find(InkModel, DEMO_INKS.polymer.name),
      dielectric: await find(InkModel, DEMO_INKS.dielectric.name),
      graphic: await find(InkModel, DEMO_INKS.graphic.name),
    },
    substrates: {
      pet: await find(SubstrateModel, DEMO_SUBSTRATES.pet.name),
      tpu: await find(SubstrateModel, DEMO_SUBSTRATES.tpu.name),
      paper: await find(SubstrateModel, DEMO_SUBSTRATES.paper.name),
    },
    printers: { north: await find(PrinterModel, DEMO_PRINTERS[0]?.name ?? ''), south: await find(PrinterModel, DEMO_PRINTERS[1]?.name ?? '') },
    heat: { oven: await find(HeatSourceModel, heat('oven')), hotPlate: await find(HeatSourceModel, heat('hot-plate')) },
    treaters: { plasma: await find(SurfaceTreaterModel, treater('plasma')), wipe: await find(SurfaceTreaterModel, treater('solvent-wipe')) },
  };
}

async function demoPerson(email: string, transaction: Transaction): Promise<UserModel> {
  const user = await UserModel.findOne({ where: { email }, transaction });
  if (!user) throw new Error(`Demo person ${email} is missing: seed the people first.`);
  return user;
}

interface DemoVersion {
  number: number;
  state: VersionState;
  content: DraftContent;
  author: UserModel;
  submitted?: { by: UserModel; daysAgo: number };
  released?: { by: UserModel; daysAgo: number };
}

/**
 * Demo data only: the fictional lab's three recipes, written inside the caller's seeding
 * transaction — TOUCH-4K (v1 released and signed by the demo quality person, v2 a draft),
 * LENS-HEAT (v1 in review) and HUMID-LBL (v1 a draft). Content goes through DraftContentSchema,
 * and a version shown as released or in review must pass the same checks the API demands.
 */
export async function seedDemoRecipes(ctx: AppContext, transaction: Transaction): Promise<void> {
  const ids = await demoIds(transaction);
  const person = (role: string) => demoPerson(DEMO_PEOPLE.find((p) => p.email.startsWith(`${role}@`))?.email ?? '', transaction);
  const [engineer, engineer2, quality] = [await person('engineer'), await person('engineer2'), await person('quality')];
  const now = ctx.clock.now().getTime();
  const at = (daysAgo: number) => new Date(now - daysAgo * DAY_MS);
  const seeded = (entityType: string, id: number, after: object) =>
    recordAudit(ctx, { actorId: null, action: `seed.${entityType}`, entityType, entityId: id, after: { id, ...after } }, transaction);

  const addRecipe = async (input: unknown, versions: DemoVersion[]) => {
    const recipe = await RecipeModel.create({ ...RecipeInputSchema.parse(input), createdBy: versions[0]?.author.id ?? null }, { transaction });
    await seeded('recipe', recipe.id, { code: recipe.code, name: recipe.name });
    for (const v of versions) {
      const contentHash = contentHashOf(v.content);
      if (v.state !== 'draft') await assertNotBlocked(v, recipe.code, transaction);
      const row = await RecipeVersionModel.create(
        {
          recipeId: recipe.id, number: v.number, state: v.state, content: v.content, contentHash, authorId: v.author.id,
          submittedBy: v.submitted?.by.id ?? null, submittedAt: v.submitted ? at(v.submitted.daysAgo) : null,
          releasedBy: v.released?.by.id ?? null, releasedAt: v.released ? at(v.released.daysAgo) : null,
        },
        { transaction },
      );
      await seeded('recipe-version', row.id, { recipeId: recipe.id, number: v.number, state: v.state, contentHash });
      if (!v.released) continue;
      const signer = v.released.by;
      const signature = await SignatureModel.create(
        { userId: signer.id, printedName: signer.name, meaning: 'approved for production', signedAt: at(v.released.daysAgo), entityType: 'recipe-version', entityId: row.id, contentHash },
        { transaction },
      );
      await seeded('signature', signature.id, { userId: signer.id, entityType: 'recipe-version', entityId: row.id, contentHash });
    }
  };

  const content = (demo: unknown) => DraftContentSchema.parse(demo);
  await addRecipe({ code: 'TOUCH-4K', name: 'Capacitive four-key touch strip', product: 'Four-key touch strip on PET', notes: 'Pilot product for the kiosk panel.' }, [
    { number: 1, state: 'released', content: content(touchStripV1(ids)), author: engineer, submitted: { by: engineer, daysAgo: 9 }, released: { by: quality, daysAgo: 8 } },
    { number: 2, state: 'draft', content: content(touchStripV2(ids)), author: engineer2 },
  ]);
  await addRecipe({ code: 'LENS-HEAT', name: 'Lens-wrap heater trace with dielectric cover', product: 'Anti-fog lens heater on TPU' }, [
    { number: 1, state: 'in-review', content: content(lensHeater(ids)), author: engineer, submitted: { by: engineer, daysAgo: 1 } },
  ]);
  await addRecipe({ code: 'HUMID-LBL', name: 'Interdigitated humidity-sensing label', product: 'Humidity label on coated paper' }, [
    { number: 1, state: 'draft', content: content(humidityLabel(ids)), author: engineer2 },
  ]);
}

/** Demo versions shown past draft must be ones the API itself would have let through. */
async function assertNotBlocked(v: DemoVersion, code: string, transaction: Transaction) {
  const { checks } = evaluateContent(v.content, await loadReferences(v.content, transaction));
  const blocked = checks.filter((c) => c.status === 'blocked').map((c) => c.title);
  if (blocked.length > 0) throw new Error(`Demo ${code} v${v.number} is ${v.state} but blocked: ${blocked.join('; ')}`);
}
