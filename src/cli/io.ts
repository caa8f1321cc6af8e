/** Where a command writes: standard output for results, standard error for messages. */
export interface CliIo {
  out(text: string): void;
  err(text: string): void;
}

/** The process's own streams. */
export const processIo: CliIo = {
  out: (text) => void process.stdout.write(text),
  err: (text) => void process.stderr.write(text),
};
