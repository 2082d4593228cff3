/** `polewright response`: frequencies (Hz), magnitude (dB), unwrapped phase (rad), group delay (samples). */
import { frequencyGrid, responseZpk } from '../../core/response/index.ts';
import { intFlag, parseArgs } from '../args.ts';
import { DESIGN_FLAGS, readDesign } from '../designInput.ts';
import { toJson } from '../json.ts';
import type { CliIo } from '../main.ts';
import { omegaGridToHz } from '../../core/units.ts';

/** Most frequency points one call may ask for. */
export const MAX_RESPONSE_POINTS = 1_000_000;
/** Lowest frequency of a log grid, as a fraction of the sample rate. */
export const LOG_GRID_MIN_FRACTION = 1e-4;

/** Runs `response`; returns the exit code. */
export function runResponse(argv: string[], io: CliIo): number {
  const args = parseArgs(argv, [...DESIGN_FLAGS, 'points'], ['json', 'log']);
  const d = readDesign(args);
  for (const note of d.notes) io.stderr(`note: ${note}\n`);
  const points = intFlag(args, 'points', 512, 2, MAX_RESPONSE_POINTS);
  const log = args.switches.has('log');
  const omega = frequencyGrid(points, log ? { log: true, fMin: 2 * Math.PI * LOG_GRID_MIN_FRACTION } : {});
  const r = responseZpk(d.zpk, omega);
  const frequencies = Array.from(omegaGridToHz(omega, d.sampleRate));
  if (args.switches.has('json')) {
    io.stdout(
      toJson({
        sampleRate: d.sampleRate,
        frequencies,
        magnitudeDb: r.magnitudeDb,
        phase: r.phaseUnwrapped,
        groupDelay: r.groupDelay,
      }),
    );
    return 0;
  }
  const rows = ['frequency_hz,magnitude_db,phase_rad,group_delay_samples'];
  for (let i = 0; i < points; i++) {
    rows.push(`${frequencies[i]},${r.magnitudeDb[i]},${r.phaseUnwrapped[i]},${r.groupDelay[i]}`);
  }
  io.stdout(rows.join('\n') + '\n');
  return 0;
}
