/**
 * The complex value of a channel on the imaginary axis, G(j omega) = c (j omega I - A)^-1 b + d,
 * times e^(-j omega delay): the frequency response straight from the model, by Gaussian
 * elimination with partial pivoting in complex arithmetic (no polynomials, so no loss of
 * digits on high-order or badly scaled models; Golub and Van Loan, Matrix Computations,
 * 4th ed., 3.4).
 */
import type { Complex } from '../types.js';
import type { LinearChannel } from './linear-channel.js';

let work = { size: -1, re: new Float64Array(0), im: new Float64Array(0), xr: new Float64Array(0), xi: new Float64Array(0) };

/** G(j omega) [output unit per input unit], omega [rad/s]. Infinite when j omega is a pole. */
export function channelValue(channel: LinearChannel, omega: number): Complex {
  const { n, A, b, c, d, delay } = channel;
  if (work.size !== n) {
    work = { size: n, re: new Float64Array(n * n), im: new Float64Array(n * n), xr: new Float64Array(n), xi: new Float64Array(n) };
  }
  const { re, im, xr, xi } = work;
  for (let k = 0; k < n * n; k += 1) {
    re[k] = -A[k]!;
    im[k] = 0;
  }
  for (let i = 0; i < n; i += 1) {
    im[i * n + i] = omega;
    xr[i] = b[i]!;
    xi[i] = 0;
  }
  // forward elimination with row pivoting on |.|^2
  for (let k = 0; k < n; k += 1) {
    let p = k;
    let best = re[k * n + k]! ** 2 + im[k * n + k]! ** 2;
    for (let i = k + 1; i < n; i += 1) {
      const m = re[i * n + k]! ** 2 + im[i * n + k]! ** 2;
      if (m > best) {
        best = m;
        p = i;
      }
    }
    if (best === 0) return { re: Infinity, im: Infinity };
    if (p !== k) {
      for (let j = k; j < n; j += 1) {
        swap(re, k * n + j, p * n + j);
        swap(im, k * n + j, p * n + j);
      }
      swap(xr, k, p);
      swap(xi, k, p);
    }
    const pr = re[k * n + k]!;
    const pi = im[k * n + k]!;
    for (let i = k + 1; i < n; i += 1) {
      const ar = re[i * n + k]!;
      const ai = im[i * n + k]!;
      if (ar === 0 && ai === 0) continue;
      // factor = a_ik / a_kk
      const fr = (ar * pr + ai * pi) / best;
      const fi = (ai * pr - ar * pi) / best;
      for (let j = k + 1; j < n; j += 1) {
        const ur = re[k * n + j]!;
        const ui = im[k * n + j]!;
        re[i * n + j] = re[i * n + j]! - (fr * ur - fi * ui);
        im[i * n + j] = im[i * n + j]! - (fr * ui + fi * ur);
      }
      const br = xr[k]!;
      const bi = xi[k]!;
      xr[i] = xr[i]! - (fr * br - fi * bi);
      xi[i] = xi[i]! - (fr * bi + fi * br);
    }
  }
  // back substitution
  for (let i = n - 1; i >= 0; i -= 1) {
    let sr = xr[i]!;
    let si = xi[i]!;
    for (let j = i + 1; j < n; j += 1) {
      const ur = re[i * n + j]!;
      const ui = im[i * n + j]!;
      sr -= ur * xr[j]! - ui * xi[j]!;
      si -= ur * xi[j]! + ui * xr[j]!;
    }
    const pr = re[i * n + i]!;
    const pi = im[i * n + i]!;
    const m = pr * pr + pi * pi;
    xr[i] = (sr * pr + si * pi) / m;
    xi[i] = (si * pr - sr * pi) / m;
  }
  let gr = d;
  let gi = 0;
  for (let i = 0; i < n; i += 1) {
    gr += c[i]! * xr[i]!;
    gi += c[i]! * xi[i]!;
  }
  if (delay === 0) return { re: gr, im: gi };
  const cr = Math.cos(omega * delay);
  const ci = -Math.sin(omega * delay);
  return { re: gr * cr - gi * ci, im: gr * ci + gi * cr };
}

function swap(a: Float64Array, i: number, j: number): void {
  const t = a[i]!;
  a[i] = a[j]!;
  a[j] = t;
}
