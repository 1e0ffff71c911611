// Runs the `driftgrid` command in-process, capturing what it prints.
import { vi } from 'vitest';
import { main } from '../../src/cli/main';

export interface CliRun {
  readonly status: number;
  readonly stdout: string;
  readonly stderr: string;
}

export async function runCli(...args: string[]): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const out = vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => {
    stdout += String(chunk);
    return true;
  });
  const err = vi.spyOn(process.stderr, 'write').mockImplementation((chunk: string | Uint8Array) => {
    stderr += String(chunk);
    return true;
  });
  try {
    const status = await main(args);
    return { status, stdout, stderr };
  } finally {
    out.mockRestore();
    err.mockRestore();
  }
}
