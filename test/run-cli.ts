/** The command line in-process: main() with captured output, a fixed clock and no colour. */
import { main } from '../src/cli.js';

export async function runCli(...argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(argv, { out: (t) => out.push(t), err: (t) => err.push(t), color: false, now: () => new Date('2026-12-01T12:00:00Z') });
  return { code, out: out.join('\n'), err: err.join('\n') };
}
