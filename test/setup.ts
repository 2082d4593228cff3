/**
 * Every test file starts as the command line does: with the design engine, the exact checks and the full
 * design reader installed, and the page's rate-change code (store/rateChange.ts) loaded (the page loads them
 * after its first paint; test/store/persistPending.test.ts and
 * test/store/designEngine.test.ts remove them to check the page's path). They are imported in a hook, after
 * the test file's own module mocks are in place (a test that mocks the designer registry gets a reader
 * built on the mocked one).
 */
import { beforeAll } from 'vitest';

beforeAll(async () => {
  const [full, reader, engine, slot, checks, checksSlot, rate] = await Promise.all([
    import('../src/share/schema/full.ts'),
    import('../src/share/schema/reader.ts'),
    import('../src/core/design/engine.ts'),
    import('../src/core/design/engineSlot.ts'),
    import('../src/core/stability/exactChecks.ts'),
    import('../src/core/stability/exactChecksSlot.ts'),
    import('../src/store/rateChange.ts'),
  ]);
  await rate.loadRateChange();
  reader.installFullReader(full);
  slot.installDesignEngine(engine.DESIGN_ENGINE);
  checksSlot.installExactChecks(checks.EXACT_CHECKS);
});
