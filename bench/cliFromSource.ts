/** The command line run from its TypeScript sources (what `polewright` did before it was bundled), for bench/cli.ts. */
import { main } from '../src/cli/main.ts';

process.exitCode = await main(process.argv.slice(2), {
  stdout: (s) => process.stdout.write(s),
  stderr: (s) => process.stderr.write(s),
});
