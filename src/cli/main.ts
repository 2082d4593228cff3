/** Command-line entry point: returns the process exit code. */
export interface CliIo {
  stdout: (s: string) => void;
  stderr: (s: string) => void;
}
export async function main(argv: string[], io: CliIo): Promise<number> {
  io.stdout(`polewright: ${argv.join(' ')}\n`);
  return 0;
}
