import { afterAll, beforeAll } from 'vitest';

import { signedInUser, type SignedIn } from './fixtures';
import { createTestContext, type TestContext } from './test-context';

/** What a catalogue route test file works with; the fields are filled in its beforeAll. */
export interface CatalogueLab {
  t: TestContext;
  /** The engineer who writes to the catalogues. */
  engineer: SignedIn;
  /** A POST as the engineer, with the CSRF header. */
  post(path: string, body: object): ReturnType<SignedIn['agent']['post']>;
}

/** Registers the file's beforeAll and afterAll: the app on the test database and a signed-in engineer. */
export function setUpCatalogueLab(): CatalogueLab {
  const lab = {
    post: (path, body) => lab.engineer.agent.post(path).set('X-CSRF-Token', lab.engineer.csrf).send(body),
  } as CatalogueLab;
  beforeAll(async () => {
    lab.t = await createTestContext();
    lab.engineer = await signedInUser(lab.t.app, 'engineer');
  });
  afterAll(() => lab.t.close());
  return lab;
}
