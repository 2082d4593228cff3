/**
 * Every test file starts as the command line does: with the full design reader installed (the page loads it
 * after its first paint; test/store/persistPending.test.ts removes it to check the page's path). It is
 * imported in a hook, after the test file's own module mocks are in place (a test that mocks the designer
 * registry gets a reader built on the mocked one).
 */
import { beforeAll } from 'vitest';

beforeAll(async () => {
  const [full, reader] = await Promise.all([
    import('../src/share/schema/full.ts'),
    import('../src/share/schema/reader.ts'),
  ]);
  reader.installFullReader(full);
});
