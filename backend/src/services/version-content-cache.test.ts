import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { withConnection } from '../db/direct-rows';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { createRunRecords, releasedVersion, runnableContent } from '../../test/run-fixtures';
import { createTestContext, type TestContext } from '../../test/test-context';
import { contentHashOf, versionContent } from './recipe-dto';
import { cachedVersionContent } from './version-content-cache';

let t: TestContext;
beforeAll(async () => {
  t = await createTestContext();
});
afterAll(() => t.close());

const cached = (versionId: number) => withConnection(t.ctx.sequelize, (c) => cachedVersionContent(c, versionId));

describe('version content cache', () => {
  it('when a version is read twice, then the second read is the same frozen object; once its content changes, then the new content is read', async () => {
    const content = runnableContent(await createRunRecords());
    const { versionId } = await releasedVersion(content, 'draft');
    const first = await cached(versionId);
    expect(first?.steps.map((s) => s.id)).toEqual(content.steps.map((s) => s.id));
    expect(await cached(versionId)).toBe(first);
    expect(Object.isFrozen(first?.steps[0])).toBe(true);
    expect(() => (first as { steps: unknown[] }).steps.push({})).toThrow(TypeError);

    const changed = { ...content, steps: content.steps.slice(0, 2) };
    await RecipeVersionModel.update({ content: changed, contentHash: contentHashOf(changed) }, { where: { id: versionId } });
    const after = await cached(versionId);
    expect(after?.steps).toHaveLength(2);
    expect(after).toEqual(versionContent((await RecipeVersionModel.findByPk(versionId)) as RecipeVersionModel));
    expect(await cached(999_999_999)).toBeNull();
  });
});
