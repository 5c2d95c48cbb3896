/** Test helper: a rational transfer function (polynomials in s, highest power first) at s = j w. */
import type { Complex } from '../../src/types.js';

export function polyAt(coefficients: readonly number[], w: number): Complex {
  let re = 0;
  let im = 0;
  for (const c of coefficients) {
    // (re + j im) * (j w) + c
    const nre = -im * w + c;
    const nim = re * w;
    re = nre;
    im = nim;
  }
  return { re, im };
}

export function mul(a: Complex, b: Complex): Complex {
  return { re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re };
}

export function div(a: Complex, b: Complex): Complex {
  const d = b.re * b.re + b.im * b.im;
  return { re: (a.re * b.re + a.im * b.im) / d, im: (a.im * b.re - a.re * b.im) / d };
}

/** prod of num_k / den_k at j w, times e^(-j w tau) */
export function responseAt(factors: readonly { num: number[]; den: number[] }[], w: number, tau = 0): Complex {
  let h: Complex = { re: Math.cos(w * tau), im: -Math.sin(w * tau) };
  for (const f of factors) h = mul(h, div(polyAt(f.num, w), polyAt(f.den, w)));
  return h;
}
