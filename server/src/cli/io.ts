/** Output sinks for the CLI, so commands can be tested without a process. */
export interface CliIO {
  out(line: string): void;
  err(line: string): void;
}

export const processIO: CliIO = {
  out: (line) => process.stdout.write(line + '\n'),
  err: (line) => process.stderr.write(line + '\n'),
};
