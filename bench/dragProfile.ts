/**
 * Where a drag's main-thread time goes (not a benchmark table: a tool for choosing what to speed up). Serves
 * PW_DIST (build it with `npx vite build --minify false --outDir <dir>` for readable names), drags once per
 * configuration of PW_DRAG_ORDERS × PW_DRAG_TABS × PW_DRAG_SHADING × PW_DRAG_RECORDING as bench/drag.ts does,
 * and prints per move the median thread CPU of each kind of main-thread work in the trace, and the
 * functions with the most self time in a CPU profile of the drag.
 * Run: `PW_DIST=/tmp/dist npx tsx bench/dragProfile.ts`.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium } from '@playwright/test';
import { CHROMIUM_ARGS, CHROMIUM_PATH } from '../e2e/support/chromium.ts';
import {
  TAB_LABEL,
  TABS,
  dragOnce,
  openPage,
  serve,
  stopServer,
  waitForServer,
  writeRecording,
} from './drag.ts';
import { MOVE_MARK, type TraceEvent } from './dragTrace.ts';
import { cell, median } from './timing.ts';

const env = (k: string) => process.env[k]?.trim() || undefined;
const list = (k: string, all: readonly string[]) => env(k)?.split(',') ?? [...all];

/** Trace event names grouped into kinds of work. */
const KINDS: Record<string, string> = {
  EventDispatch: 'input + React',
  FunctionCall: 'script',
  FireAnimationFrame: 'animation frame',
  UpdateLayoutTree: 'style',
  Layout: 'layout',
  PrePaint: 'prepaint',
  Paint: 'paint',
  Layerize: 'layerize',
  Commit: 'commit',
  MajorGC: 'gc',
  MinorGC: 'gc',
};

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  hitCount?: number;
  children?: number[];
}

function breakdown(events: TraceEvent[]): Map<string, number[]> {
  const marks = events
    .filter((e) => e.name === MOVE_MARK)
    .map((e) => e.ts)
    .sort((a, b) => a - b);
  if (marks.length === 0) return new Map();
  const mark = events.find((e) => e.name === MOVE_MARK)!;
  const own = events.filter((e) => e.pid === mark.pid && e.tid === mark.tid && e.ph === 'X' && KINDS[e.name]);
  const out = new Map<string, number[]>();
  for (const kind of new Set(Object.values(KINDS))) out.set(kind, new Array<number>(marks.length).fill(0));
  // Outermost events of a kind only (EventDispatch holds FunctionCalls, and so on).
  own.sort((a, b) => a.ts - b.ts);
  let openEnd = -1;
  for (const e of own) {
    if (e.ts < openEnd) continue;
    openEnd = e.ts + e.dur!;
    let k = 0;
    while (k + 1 < marks.length && e.ts >= marks[k + 1]!) k++;
    if (e.ts < marks[0]! - 20_000) continue;
    out.get(KINDS[e.name]!)![k]! += (e.tdur ?? e.dur!) / 1000;
  }
  return out;
}

const dist = env('PW_DIST');
const port = Number(env('PW_BENCH_PORT') ?? 4412);
const build = { name: 'profile', dir: dist, port };
const tmp = mkdtempSync(join(tmpdir(), 'pw-prof-'));
const rec = list('PW_DRAG_RECORDING', ['off']);
const recording = rec.includes('on') ? writeRecording(tmp) : null;
const server = await serve(build);
const browser = await chromium.launch({
  executablePath: CHROMIUM_PATH,
  args: [...CHROMIUM_ARGS, `--explicitly-allowed-ports=${port}`],
});
try {
  await waitForServer(`http://127.0.0.1:${port}/`, 30_000);
  for (const r of rec) {
    for (const order of list('PW_DRAG_ORDERS', ['32']).map(Number)) {
      const page = await openPage(browser, build, order, r === 'on' ? recording : null);
      const cdp = await page.context().newCDPSession(page);
      await cdp.send('Profiler.enable');
      await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
      for (const tab of list('PW_DRAG_TABS', TABS) as (typeof TABS)[number][]) {
        for (const shading of list('PW_DRAG_SHADING', ['off', 'on'])) {
          await page.getByRole('tab', { name: TAB_LABEL[tab] }).click();
          await page.getByLabel('|H| shading').setChecked(shading === 'on');
          type Profile = { nodes: ProfileNode[]; samples: number[]; timeDeltas: number[] };
          const holder: { profile: Profile | null } = { profile: null };
          // Profile the moves only (not the press, the release or the undo after).
          const result = await dragOnce(page, {
            moves: async (run) => {
              await cdp.send('Profiler.start');
              await run();
              holder.profile = ((await cdp.send('Profiler.stop')) as unknown as { profile: Profile }).profile;
            },
          });
          if (!holder.profile) throw new Error('no profile');
          const { nodes, samples, timeDeltas } = holder.profile;
          const parts = [...breakdown(result.events)].map(([k, xs]) => `${k} ${cell(median(xs))}`).join(', ');
          console.log(
            `\n== recording ${r}, order ${order}, ${tab}, shading ${shading}: CPU median ${cell(median(result.cpu))} ms/move; ${parts}`,
          );
          // Per move: self time of each function, and inclusive time of each named function (its own
          // samples and those of everything it called), from the sampled stacks.
          const byId = new Map(nodes.map((n) => [n.id, n]));
          const parent = new Map<number, number>();
          for (const n of nodes) for (const c of n.children ?? []) parent.set(c, n.id);
          const nameOf = (n: ProfileNode) =>
            `${n.callFrame.functionName || '(anon)'} ${n.callFrame.url.split('/').pop()}:${n.callFrame.lineNumber}`;
          const self = new Map<string, number>();
          const inclusive = new Map<string, number>();
          const moves = result.samples.length;
          samples.forEach((id, i) => {
            const ms = (timeDeltas[i + 1] ?? 0) / 1000 / moves;
            const leaf = byId.get(id)!;
            if (leaf.callFrame.functionName === '(idle)') return;
            self.set(nameOf(leaf), (self.get(nameOf(leaf)) ?? 0) + ms);
            const seen = new Set<string>();
            for (let n: ProfileNode | undefined = leaf; n; n = byId.get(parent.get(n.id) ?? -1)) {
              const name = nameOf(n);
              if (!n.callFrame.functionName || seen.has(name)) continue;
              seen.add(name);
              inclusive.set(name, (inclusive.get(name) ?? 0) + ms);
            }
          });
          // The same under the scheduler's deferred work (passive effects and what they set off).
          const deferred = new Map<string, number>();
          samples.forEach((id, i) => {
            const ms = (timeDeltas[i + 1] ?? 0) / 1000 / moves;
            const chain: ProfileNode[] = [];
            for (let n: ProfileNode | undefined = byId.get(id); n; n = byId.get(parent.get(n.id) ?? -1))
              chain.push(n);
            if (!chain.some((n) => n.callFrame.functionName === 'performWorkUntilDeadline')) return;
            const seen = new Set<string>();
            for (const n of chain) {
              const name = nameOf(n);
              if (!/^[A-Z]|^use|^set/.test(n.callFrame.functionName) || seen.has(name)) continue;
              seen.add(name);
              deferred.set(name, (deferred.get(name) ?? 0) + ms);
            }
          });
          const show = (m: Map<string, number>, what: string, count: number) => {
            console.log(`  ${what} (ms per move):`);
            for (const [k, v] of [...m].sort((a, b) => b[1] - a[1]).slice(0, count))
              console.log(`    ${v.toFixed(3).padStart(7)}  ${k}`);
          };
          show(self, 'self', Number(env('PW_PROFILE_SELF') ?? 20));
          show(inclusive, 'inclusive', Number(env('PW_PROFILE_INCLUSIVE') ?? 40));
          // Components (capitalised function names) and selectors, by inclusive time.
          const named = new Map([...inclusive].filter(([k]) => /^(?:[A-Z]|select)/.test(k)));
          show(named, 'components and selectors, inclusive', Number(env('PW_PROFILE_COMPONENTS') ?? 40));
          show(
            deferred,
            'components, hooks and setters in deferred work',
            Number(env('PW_PROFILE_DEFERRED') ?? 15),
          );
        }
      }
      await page.context().close();
    }
  }
} finally {
  await browser.close();
  stopServer(server);
  rmSync(tmp, { recursive: true, force: true });
}
