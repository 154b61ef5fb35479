/** The streams a command writes to: process.stdout/stderr in main.ts. */
export interface CommandIO {
  readonly stdout: { write(text: string): unknown };
  readonly stderr: { write(text: string): unknown; isTTY?: boolean };
}
