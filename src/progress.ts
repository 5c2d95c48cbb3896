/** A progress bar for long runs: on a TTY only, silent when piped or under CI. */
import cliProgress from 'cli-progress';

const MIN_CONDITIONS = 200;

export function progressReporter(stream: NodeJS.WriteStream = process.stderr): {
  onProgress: (done: number, total: number) => void;
  stop: () => void;
} {
  const enabled = Boolean(stream.isTTY) && !process.env.CI;
  let bar: cliProgress.SingleBar | undefined;
  return {
    onProgress: (done, total) => {
      if (!enabled || total < MIN_CONDITIONS) return;
      if (!bar) {
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
