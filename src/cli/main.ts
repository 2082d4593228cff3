/** The `polewright` command line: a thin front end on the engine. */
import * as fullReader from '../share/schema/full.ts';
import { installFullReader } from '../share/schema/reader.ts';
import { UsageError } from './args.ts';
import { CliFailure } from './output.ts';
import { runAnalyze } from './commands/analyze.ts';
import { runLink } from './commands/link.ts';
import { runExport } from './commands/export.ts';
import { runResponse } from './commands/response.ts';
import { runSimulate } from './commands/simulate.ts';
import { runDesign } from './commands/design.ts';
import { runSpectrum } from './commands/spectrum.ts';
import { IMPLEMENTATION_USAGE } from './implementationFlags.ts';

export interface CliIo {
  stdout: (s: string) => void;
  stderr: (s: string) => void;
}

// The command line reads every design with the full reader (zod schemas, migrations, messages) from the start.
installFullReader(fullReader);

const COMMANDS: Record<string, (argv: string[], io: CliIo) => number | Promise<number>> = {
  analyze: runAnalyze,
  response: runResponse,
  simulate: runSimulate,
  link: runLink,
  export: runExport,
  design: runDesign,
  spectrum: runSpectrum,
};

export const USAGE = `polewright — digital filter analysis on the command line

usage:
  polewright analyze  <design> [--json]
  polewright response <design> [--points N] [--log] [--json]
  polewright design   <kind> [parameters] [--json] [--out design.json]   (kinds and flags: polewright design --help)
  polewright simulate <design> [--input impulse|step|sine:<Hz>|<file.csv>|<file.wav>] [--samples N] [--json]
                      [--output <file.wav|file.csv>] [--output-format u8|i16|i24|i32|f32|f64]
                      [--channel N] [--input-rate <Hz>]
  polewright simulate <design> --fixed [--input impulse|step|sine:<Hz>|noise[:seed]|<file.csv>|<file.wav>]
                      [--amplitude A] [--input-units full-scale|codes] [--samples N] [--json]
                      [--output <file.wav|file.csv>] [--channel N] [--input-rate <Hz>]
                      ${IMPLEMENTATION_USAGE}
  polewright export   <design> [--format c|json|csv] [--name <C prefix>] [--out <file>] [--allow-warnings]
                      ${IMPLEMENTATION_USAGE}
  polewright spectrum <file.wav|file.csv> [<design>] [--window hann|hamming|blackman|flattop|rectangular]
                      [--segment auto|N] [--overlap N] [--scaling density|spectrum] [--channel N] [--input-rate <Hz>]
                      [--levels 50,150 [--level-search <percent>] [--level-weighting hann|rectangular]] [--json]
  polewright link     <design> [--base URL]       (prints a workbench link; default base http://127.0.0.1:5173/)

<design> is a design file saved from the workbench, a design link (a URL with #pw2.…), or one of:
  --b "1,0,-1" --a "1,-1.6,0.64"      coefficients of z^0, z^-1, z^-2, ...
  --eq "y[n] = 1.6y[n-1] - 0.64y[n-2] + x[n] - x[n-2]"
  --tf "(z^2 - 1)/(z^2 - 1.6z + 0.64)"
plus --fs <Hz> (sample rate; default 1, or the file's).
`;

/**
 * Runs the command line; returns the process exit code: 0 ok, 2 for a usage or input error (UsageError),
 * 1 when the work could not be done for another reason (CliFailure: a file that cannot be written) and for
 * anything unexpected, which is a bug and says "internal error"; 3 when `export` wrote an output carrying
 * warnings without --allow-warnings.
 */
export async function main(argv: string[], io: CliIo): Promise<number> {
  const [command, ...rest] = argv;
  if (command === undefined || command === '--help' || command === '-h' || command === 'help') {
    io.stdout(USAGE);
    return command === undefined ? 2 : 0;
  }
  const run = COMMANDS[command];
  if (!run) {
    io.stderr(`polewright: unknown command "${command}". Commands: ${Object.keys(COMMANDS).join(', ')}.\n`);
    return 2;
  }
  try {
    return await run(rest, io);
  } catch (e) {
    if (e instanceof UsageError) {
      io.stderr(`polewright ${command}: ${e.message}\n`);
      return 2;
    }
    if (e instanceof CliFailure) {
      io.stderr(`polewright ${command}: ${e.message}\n`);
      return 1;
    }
    io.stderr(`polewright ${command}: internal error: ${(e as Error).message}\n`);
    return 1;
  }
}
