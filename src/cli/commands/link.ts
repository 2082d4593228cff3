/** `polewright link`: prints a workbench link that opens the design exactly (numbers bit for bit). */
import { decodeLink, linkUrl } from '../../share/link/index.ts';
import { UsageError, parseArgs } from '../args.ts';
import { DESIGN_FLAGS, readDesign } from '../designInput.ts';
import type { CliIo } from '../main.ts';

/** The page address used when --base is not given (the development server). */
export const DEFAULT_BASE_URL = 'http://127.0.0.1:5173/';

/** Runs `link <design> [--base URL]`; returns the exit code. */
export function runLink(argv: string[], io: CliIo): number {
  const args = parseArgs(argv, [...DESIGN_FLAGS, 'base'], []);
  if (args.positionals.length > 1)
    throw new UsageError(`Give one design; got ${args.positionals.length} arguments.`);
  const base = args.flags.get('base') ?? DEFAULT_BASE_URL;
  if (!/^https?:\/\/\S+$/.test(base))
    throw new UsageError(`--base must be an http(s) address, e.g. ${DEFAULT_BASE_URL}; got "${base}".`);
  const d = readDesign(args);
  if (!d.shared) throw new UsageError('This design cannot be put in a link.');
  let url: string;
  try {
    url = linkUrl(base, d.shared);
  } catch (e) {
    io.stderr(`polewright link: the design cannot be put in a link: ${(e as Error).message}\n`);
    return 1;
  }
  // Read the link back, so a link that prints is one the workbench opens.
  const check = decodeLink(url);
  if (!check.ok) {
    io.stderr(`polewright link: ${check.message}\n`);
    return 1;
  }
  for (const note of d.notes) io.stderr(`note: ${note}\n`);
  io.stdout(url + '\n');
  return 0;
}
