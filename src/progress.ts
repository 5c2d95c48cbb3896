/**
 * A progress bar for long runs: on a TTY only, silent when piped or under CI. cli-progress is
 * loaded only when a bar is shown (about 14 ms of start-up otherwise spent on every run).
 */
import { createRequire } from 'node:module';
import type cliProgressModule from 'cli-progress';

const load = createRequire(import.meta.url);

const MIN_CONDITIONS = 200;

export function progressReporter(stream: NodeJS.WriteStream = process.stderr): {
  onProgress: (done: number, total: number) => void;
  stop: () => void;
} {
  const enabled = Boolean(stream.isTTY) && !process.env.CI;
  let bar: cliProgressModule.SingleBar | undefined;
  return {
    onProgress: (done, total) => {
      if (!enabled || total < MIN_CONDITIONS) return;
      if (!bar) {
        const cliProgress = load('cli-progress') as typeof cliProgressModule;
        bar = new cliProgress.SingleBar(
          { stream, format: 'analysing [{bar}] {value}/{total} conditions', hideCursor: true, clearOnComplete: true, fps: 10 },
          cliProgress.Presets.shades_classic,
        );
        bar.start(total, 0);
      }
      bar.update(done);
    },
    stop: () => bar?.stop(),
  };
}
