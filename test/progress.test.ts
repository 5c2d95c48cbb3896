import { PassThrough } from 'node:stream';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { progressReporter } from '../src/progress.js';

function fakeStream(isTTY: boolean): { stream: NodeJS.WriteStream; text: () => string } {
  const pass = new PassThrough();
  let text = '';
  pass.on('data', (chunk: Buffer) => (text += chunk.toString('utf8')));
  Object.assign(pass, { isTTY, columns: 100 });
  return { stream: pass as unknown as NodeJS.WriteStream, text: () => text };
}

describe('progress bar', () => {
  afterEach(() => vi.unstubAllEnvs());

  it('draws a bar on a terminal for a long run', async () => {
    vi.stubEnv('CI', undefined);
    const { stream, text } = fakeStream(true);
    const p = progressReporter(stream);
    p.onProgress(0, 500);
    p.onProgress(500, 500);
    p.stop();
    await new Promise((r) => setImmediate(r));
    expect(text()).toContain('analysing [');
    expect(text()).toContain('/500 conditions');
  });

  it('is silent when piped, under CI, or for a short run', async () => {
    const piped = fakeStream(false);
    const a = progressReporter(piped.stream);
    a.onProgress(10, 500);
    a.stop();

    vi.stubEnv('CI', 'true');
    const ci = fakeStream(true);
    const b = progressReporter(ci.stream);
    b.onProgress(10, 500);
    b.stop();
    vi.stubEnv('CI', undefined);
    const short = fakeStream(true);
    const c = progressReporter(short.stream);
    c.onProgress(10, 199);
    c.stop();

    await new Promise((r) => setImmediate(r));
    expect(piped.text()).toBe('');
    expect(ci.text()).toBe('');
    expect(short.text()).toBe('');
  });
});
