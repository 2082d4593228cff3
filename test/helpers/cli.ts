/** Runs the `polewright` command line in-process, the way the CLI tests call it. */
import { main } from '../../src/cli/main.ts';

export interface CliResult {
  /** The exit code main() returned. */
  code: number;
  stdout: string;
  stderr: string;
}

/** Calls main() with argv (no program name) and collects everything it writes to stdout and stderr. */
export async function runCli(argv: string[]): Promise<CliResult> {
  let stdout = '';
  let stderr = '';
  const code = await main(argv, { stdout: (s) => (stdout += s), stderr: (s) => (stderr += s) });
  return { code, stdout, stderr };
}
