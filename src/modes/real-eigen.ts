/**
 * Eigenvalues and real eigenvectors of a small dense real matrix: Householder reduction to
 * Hessenberg form, then the shifted QR iteration to real Schur form and back-substitution for
 * the eigenvectors (EISPACK orthes and hqr2; Wilkinson and Reinsch, Handbook for Automatic
 * Computation vol. II, 1971). The code follows the JAMA translation (public domain) as kept in
 * ml-matrix 6 (MIT) line for line, with the same arithmetic in the same order, on flat
 * row-major Float64Arrays instead of matrix objects: a sweep analyses thousands of 4 x 4
 * blocks, where method calls per element and the arrays made per call cost more than the
 * arithmetic, above all before the JIT has compiled the loops. test/modes/real-eigen.test.ts
 * checks it against ml-matrix itself.
 *
 * Output convention (as ml-matrix): eigenvalue j is d[j] + i e[j]; a complex pair sits in
 * adjacent places with e[j] > 0 first, and its eigenvector is V[:,j] + i V[:,j+1] (that of the
 * conjugate V[:,j] - i V[:,j+1]); a real eigenvalue's eigenvector is V[:,j].
 */

import { InternalError } from '../errors.js';

/**
 * QR steps allowed for one eigenvalue (or pair) before giving up. EISPACK's hqr2 stops at 30
 * with an error; the JAMA translation has no limit, and loops for ever on a matrix it cannot
 * reduce (a property test found one: subnormal entries beside entries of 50). After the
 * exceptional shifts at 10 and 30 steps, a block that has not split by this many never will.
 */
const MAX_ITERATIONS = 100;

export interface RealEigen {
  n: number;
  /** real parts of the eigenvalues */
  d: Float64Array;
  /** imaginary parts of the eigenvalues */
  e: Float64Array;
  /** eigenvectors, n x n row-major (see the convention above) */
  V: Float64Array;
}

interface Work extends RealEigen {
  H: Float64Array;
  ort: Float64Array;
}

const workBySize = new Map<number, Work>();

/**
 * Eigen-decomposition of the n x n row-major matrix `A` (not changed). The arrays returned are
 * work buffers reused by the next call of the same size: copy what must outlive it.
 */
export function realEigen(A: ArrayLike<number>, n: number): RealEigen {
  return solve(A, n, true);
}

/**
 * Eigenvalues only (`d`, `e`; `V` is left unset), in the same reused buffers. The arithmetic
 * on H is that of realEigen in the same order, so the eigenvalues are the same bit for bit:
 * what is left out (accumulating the transformations, the back-substitution) never feeds
 * back into H.
 */
export function realEigenvalues(A: ArrayLike<number>, n: number): Pick<RealEigen, 'n' | 'd' | 'e'> {
  return solve(A, n, false);
}

function solve(A: ArrayLike<number>, n: number, vectors: boolean): RealEigen {
  let w = workBySize.get(n);
  if (w === undefined) {
    const m = n * n;
    w = { n, d: new Float64Array(n), e: new Float64Array(n), V: new Float64Array(m), H: new Float64Array(m), ort: new Float64Array(n) };
    workBySize.set(n, w);
  }
  const { H, V, d, e, ort } = w;
  for (let k = 0; k < n * n; k += 1) H[k] = A[k]!;
  d.fill(0);
  e.fill(0);
  ort.fill(0);
  orthes(n, H, ort, V, vectors);
  hqr2(n, e, d, V, H, vectors);
  return w;
}

/** `vectors` false: H only, V is neither set nor read. */
function orthes(n: number, H: Float64Array, ort: Float64Array, V: Float64Array, vectors: boolean): void {
  const N = n;
  let low = 0;
  let high = n - 1;
  let f: number, g: number, h: number, i: number, j: number, m: number;
  let scale: number;

  for (m = low + 1; m <= high - 1; m++) {
    scale = 0;
    for (i = m; i <= high; i++) {
      scale = scale + Math.abs(H[i * N + (m - 1)]!);
    }

    if (scale !== 0) {
      h = 0;
      for (i = high; i >= m; i--) {
        ort[i] = H[i * N + (m - 1)]! / scale;
        h += ort[i]! * ort[i]!;
      }

      g = Math.sqrt(h);
      if (ort[m]! > 0) {
        g = -g;
      }

      h = h - ort[m]! * g;
      ort[m] = ort[m]! - g;

      for (j = m; j < n; j++) {
        f = 0;
        for (i = high; i >= m; i--) {
          f += ort[i]! * H[i * N + j]!;
        }

        f = f / h;
        for (i = m; i <= high; i++) {
          H[i * N + j] = H[i * N + j]! - f * ort[i]!;
        }
      }

      for (i = 0; i <= high; i++) {
        f = 0;
        for (j = high; j >= m; j--) {
          f += ort[j]! * H[i * N + j]!;
        }

        f = f / h;
        for (j = m; j <= high; j++) {
          H[i * N + j] = H[i * N + j]! - f * ort[j]!;
        }
      }

      ort[m] = scale * ort[m]!;
      H[m * N + (m - 1)] = scale * g;
    }
  }

  if (!vectors) return;

  for (i = 0; i < n; i++) {
    for (j = 0; j < n; j++) {
      V[i * N + j] = i === j ? 1 : 0;
    }
  }

  for (m = high - 1; m >= low + 1; m--) {
    if (H[m * N + (m - 1)]! !== 0) {
      for (i = m + 1; i <= high; i++) {
        ort[i] = H[i * N + (m - 1)]!;
      }

      for (j = m; j <= high; j++) {
        g = 0;
        for (i = m; i <= high; i++) {
          g += ort[i]! * V[i * N + j]!;
        }

        g = g / ort[m]! / H[m * N + (m - 1)]!;
        for (i = m; i <= high; i++) {
          V[i * N + j] = V[i * N + j]! + g * ort[i]!;
        }
      }
    }
  }
}

/**
 * hqr2 of EISPACK, in four parts that the JIT compiles one by one: as one 400-line function it
 * took 40-100 ms to compile, four times over in a 10,000-condition sweep, while the sweep ran
 * in the interpreter.
 */
function hqr2(nn: number, e: Float64Array, d: Float64Array, V: Float64Array, H: Float64Array, vectors: boolean): void {
  const N = nn;
  const low = 0;
  const high = nn - 1;
  let norm = 0;
  let i: number, j: number;
  for (i = 0; i < nn; i++) {
    if (i < low || i > high) {
      d[i] = H[i * N + i]!;
      e[i] = 0;
    }

    for (j = Math.max(i - 1, 0); j < nn; j++) {
      norm = norm + Math.abs(H[i * N + j]!);
    }
  }

  reduceToSchur(nn, e, d, V, H, norm, vectors);

  if (!vectors || norm === 0) {
    return;
  }

  for (let n = nn - 1; n >= 0; n--) {
    const p = d[n]!;
    const q = e[n]!;
    if (q === 0) substituteReal(nn, n, p, e, d, H, norm);
    else if (q < 0) substituteComplex(nn, n, p, q, e, d, H, norm);
  }

  backTransform(nn, V, H);
}

/** The shifted QR iteration of hqr2: H to real Schur form, the eigenvalues into d and e. */
function reduceToSchur(nn: number, e: Float64Array, d: Float64Array, V: Float64Array, H: Float64Array, norm: number, vectors: boolean): void {
  const N = nn;
  let n = nn - 1;
  const low = 0;
  const high = nn - 1;
  const eps = Number.EPSILON;
  let exshift = 0;
  let p = 0;
  let q = 0;
  let iter = 0;
  let i: number, j: number, k: number, l: number, m: number, w: number, x: number, y: number;
  let notlast: boolean;
  let r = 0;
  let s = 0;
  let z = 0;
  while (n >= low) {
    l = n;
    while (l > low) {
      s = Math.abs(H[(l - 1) * N + (l - 1)]!) + Math.abs(H[l * N + l]!);
      if (s === 0) {
        s = norm;
      }
      if (Math.abs(H[l * N + (l - 1)]!) < eps * s) {
        break;
      }
      l--;
    }

    if (l === n) {
      H[n * N + n] = H[n * N + n]! + exshift;
      d[n] = H[n * N + n]!;
      e[n] = 0;
      n--;
      iter = 0;
    } else if (l === n - 1) {
      w = H[n * N + (n - 1)]! * H[(n - 1) * N + n]!;
      p = (H[(n - 1) * N + (n - 1)]! - H[n * N + n]!) / 2;
      q = p * p + w;
      z = Math.sqrt(Math.abs(q));
      H[n * N + n] = H[n * N + n]! + exshift;
      H[(n - 1) * N + (n - 1)] = H[(n - 1) * N + (n - 1)]! + exshift;
      x = H[n * N + n]!;

      if (q >= 0) {
        z = p >= 0 ? p + z : p - z;
        d[n - 1] = x + z;
        d[n] = d[n - 1]!;
        if (z !== 0) {
          d[n] = x - w / z;
        }
        e[n - 1] = 0;
        e[n] = 0;
        x = H[n * N + (n - 1)]!;
        s = Math.abs(x) + Math.abs(z);
        p = x / s;
        q = z / s;
        r = Math.sqrt(p * p + q * q);
        p = p / r;
        q = q / r;

        for (j = n - 1; j < nn; j++) {
          z = H[(n - 1) * N + j]!;
          H[(n - 1) * N + j] = q * z + p * H[n * N + j]!;
          H[n * N + j] = q * H[n * N + j]! - p * z;
        }

        for (i = 0; i <= n; i++) {
          z = H[i * N + (n - 1)]!;
          H[i * N + (n - 1)] = q * z + p * H[i * N + n]!;
          H[i * N + n] = q * H[i * N + n]! - p * z;
        }

        for (i = low; vectors && i <= high; i++) {
          z = V[i * N + (n - 1)]!;
          V[i * N + (n - 1)] = q * z + p * V[i * N + n]!;
          V[i * N + n] = q * V[i * N + n]! - p * z;
        }
      } else {
        d[n - 1] = x + p;
        d[n] = x + p;
        e[n - 1] = z;
        e[n] = -z;
      }

      n = n - 2;
      iter = 0;
    } else {
      x = H[n * N + n]!;
      y = 0;
      w = 0;
      if (l < n) {
        y = H[(n - 1) * N + (n - 1)]!;
        w = H[n * N + (n - 1)]! * H[(n - 1) * N + n]!;
      }

      if (iter === 10) {
        exshift += x;
        for (i = low; i <= n; i++) {
          H[i * N + i] = H[i * N + i]! - x;
        }
        s = Math.abs(H[n * N + (n - 1)]!) + Math.abs(H[(n - 1) * N + (n - 2)]!);
        x = y = 0.75 * s;
        w = -0.4375 * s * s;
      }

      if (iter === 30) {
        s = (y - x) / 2;
        s = s * s + w;
        if (s > 0) {
          s = Math.sqrt(s);
          if (y < x) {
            s = -s;
          }
          s = x - w / ((y - x) / 2 + s);
          for (i = low; i <= n; i++) {
            H[i * N + i] = H[i * N + i]! - s;
          }
          exshift += s;
          x = y = w = 0.964;
        }
      }

      iter = iter + 1;
      if (iter > MAX_ITERATIONS) {
        throw new InternalError(`eigenvalues of a ${nn} x ${nn} block did not converge in ${MAX_ITERATIONS} QR steps`);
      }

      m = n - 2;
      while (m >= l) {
        z = H[m * N + m]!;
        r = x - z;
        s = y - z;
        p = (r * s - w) / H[(m + 1) * N + m]! + H[m * N + (m + 1)]!;
        q = H[(m + 1) * N + (m + 1)]! - z - r - s;
        r = H[(m + 2) * N + (m + 1)]!;
        s = Math.abs(p) + Math.abs(q) + Math.abs(r);
        p = p / s;
        q = q / s;
        r = r / s;
        if (m === l) {
          break;
        }
        if (
          Math.abs(H[m * N + (m - 1)]!) * (Math.abs(q) + Math.abs(r)) <
          eps *
            (Math.abs(p) *
              (Math.abs(H[(m - 1) * N + (m - 1)]!) +
                Math.abs(z) +
                Math.abs(H[(m + 1) * N + (m + 1)]!)))
        ) {
          break;
        }
        m--;
      }

      for (i = m + 2; i <= n; i++) {
        H[i * N + (i - 2)] = 0;
        if (i > m + 2) {
          H[i * N + (i - 3)] = 0;
        }
      }

      for (k = m; k <= n - 1; k++) {
        notlast = k !== n - 1;
        if (k !== m) {
          p = H[k * N + (k - 1)]!;
          q = H[(k + 1) * N + (k - 1)]!;
          r = notlast ? H[(k + 2) * N + (k - 1)]! : 0;
          x = Math.abs(p) + Math.abs(q) + Math.abs(r);
          if (x !== 0) {
            p = p / x;
            q = q / x;
            r = r / x;
          }
        }

        if (x === 0) {
          break;
        }

        s = Math.sqrt(p * p + q * q + r * r);
        if (p < 0) {
          s = -s;
        }

        if (s !== 0) {
          if (k !== m) {
            H[k * N + (k - 1)] = -s * x;
          } else if (l !== m) {
            H[k * N + (k - 1)] = -H[k * N + (k - 1)]!;
          }

          p = p + s;
          x = p / s;
          y = q / s;
          z = r / s;
          q = q / p;
          r = r / p;

          for (j = k; j < nn; j++) {
            p = H[k * N + j]! + q * H[(k + 1) * N + j]!;
            if (notlast) {
              p = p + r * H[(k + 2) * N + j]!;
              H[(k + 2) * N + j] = H[(k + 2) * N + j]! - p * z;
            }

            H[k * N + j] = H[k * N + j]! - p * x;
            H[(k + 1) * N + j] = H[(k + 1) * N + j]! - p * y;
          }

          for (i = 0; i <= Math.min(n, k + 3); i++) {
            p = x * H[i * N + k]! + y * H[i * N + (k + 1)]!;
            if (notlast) {
              p = p + z * H[i * N + (k + 2)]!;
              H[i * N + (k + 2)] = H[i * N + (k + 2)]! - p * r;
            }

            H[i * N + k] = H[i * N + k]! - p;
            H[i * N + (k + 1)] = H[i * N + (k + 1)]! - p * q;
          }

          for (i = low; vectors && i <= high; i++) {
            p = x * V[i * N + k]! + y * V[i * N + (k + 1)]!;
            if (notlast) {
              p = p + z * V[i * N + (k + 2)]!;
              V[i * N + (k + 2)] = V[i * N + (k + 2)]! - p * r;
            }

            V[i * N + k] = V[i * N + k]! - p;
            V[i * N + (k + 1)] = V[i * N + (k + 1)]! - p * q;
          }
        }
      }
    }
  }
}

/** Back-substitution of hqr2 for the real eigenvalue d[n]: its eigenvector into column n of H. */
function substituteReal(nn: number, n: number, p: number, e: Float64Array, d: Float64Array, H: Float64Array, norm: number): void {
  const N = nn;
  const eps = Number.EPSILON;
  let q = 0;
  let i: number, j: number, l: number, t: number, w: number, x: number, y: number;
  let r = 0;
  let s = 0;
  let z = 0;
  l = n;
  H[n * N + n] = 1;
  for (i = n - 1; i >= 0; i--) {
    w = H[i * N + i]! - p;
    r = 0;
    for (j = l; j <= n; j++) {
      r = r + H[i * N + j]! * H[j * N + n]!;
    }

    if (e[i]! < 0) {
      z = w;
      s = r;
    } else {
      l = i;
      if (e[i]! === 0) {
        H[i * N + n] = w !== 0 ? -r / w : -r / (eps * norm);
      } else {
        x = H[i * N + (i + 1)]!;
        y = H[(i + 1) * N + i]!;
        q = (d[i]! - p) * (d[i]! - p) + e[i]! * e[i]!;
        t = (x * s - z * r) / q;
        H[i * N + n] = t;
        H[(i + 1) * N + n] = Math.abs(x) > Math.abs(z) ? (-r - w * t) / x : (-s - y * t) / z;
      }

      t = Math.abs(H[i * N + n]!);
      if (eps * t * t > 1) {
        for (j = i; j <= n; j++) {
          H[j * N + n] = H[j * N + n]! / t;
        }
      }
    }
  }
}

/** Back-substitution of hqr2 for the complex pair ending at n (q = e[n] < 0): columns n - 1 and n of H. */
function substituteComplex(nn: number, n: number, p: number, q: number, e: Float64Array, d: Float64Array, H: Float64Array, norm: number): void {
  const N = nn;
  const eps = Number.EPSILON;
  let i: number, j: number, l: number, t: number, w: number, x: number, y: number;
  let ra: number, sa: number, vr: number, vi: number;
  let r = 0;
  let s = 0;
  let z = 0;
  l = n - 1;

  if (Math.abs(H[n * N + (n - 1)]!) > Math.abs(H[(n - 1) * N + n]!)) {
    H[(n - 1) * N + (n - 1)] = q / H[n * N + (n - 1)]!;
    H[(n - 1) * N + n] = -(H[n * N + n]! - p) / H[n * N + (n - 1)]!;
  } else {
    cdiv(0, -H[(n - 1) * N + n]!, H[(n - 1) * N + (n - 1)]! - p, q);
    H[(n - 1) * N + (n - 1)] = quotientRe;
    H[(n - 1) * N + n] = quotientIm;
  }

  H[n * N + (n - 1)] = 0;
  H[n * N + n] = 1;
  for (i = n - 2; i >= 0; i--) {
    ra = 0;
    sa = 0;
    for (j = l; j <= n; j++) {
      ra = ra + H[i * N + j]! * H[j * N + (n - 1)]!;
      sa = sa + H[i * N + j]! * H[j * N + n]!;
    }

    w = H[i * N + i]! - p;

    if (e[i]! < 0) {
      z = w;
      r = ra;
      s = sa;
    } else {
      l = i;
      if (e[i]! === 0) {
        cdiv(-ra, -sa, w, q);
        H[i * N + (n - 1)] = quotientRe;
        H[i * N + n] = quotientIm;
      } else {
        x = H[i * N + (i + 1)]!;
        y = H[(i + 1) * N + i]!;
        vr = (d[i]! - p) * (d[i]! - p) + e[i]! * e[i]! - q * q;
        vi = (d[i]! - p) * 2 * q;
        if (vr === 0 && vi === 0) {
          vr =
            eps *
            norm *
            (Math.abs(w) +
              Math.abs(q) +
              Math.abs(x) +
              Math.abs(y) +
              Math.abs(z));
        }
        cdiv(
          x * r - z * ra + q * sa,
          x * s - z * sa - q * ra,
          vr,
          vi,
        );
        H[i * N + (n - 1)] = quotientRe;
        H[i * N + n] = quotientIm;
        if (Math.abs(x) > Math.abs(z) + Math.abs(q)) {
          H[(i + 1) * N + (n - 1)] = (-ra - w * H[i * N + (n - 1)]! + q * H[i * N + n]!) / x;
          H[(i + 1) * N + n] = (-sa - w * H[i * N + n]! - q * H[i * N + (n - 1)]!) / x;
        } else {
          cdiv(
            -r - y * H[i * N + (n - 1)]!,
            -s - y * H[i * N + n]!,
            z,
            q,
          );
          H[(i + 1) * N + (n - 1)] = quotientRe;
          H[(i + 1) * N + n] = quotientIm;
        }
      }

      t = Math.max(Math.abs(H[i * N + (n - 1)]!), Math.abs(H[i * N + n]!));
      if (eps * t * t > 1) {
        for (j = i; j <= n; j++) {
          H[j * N + (n - 1)] = H[j * N + (n - 1)]! / t;
          H[j * N + n] = H[j * N + n]! / t;
        }
      }
    }
  }
}

/** Back-transformation of hqr2: eigenvectors of the original matrix, V := V H. */
function backTransform(nn: number, V: Float64Array, H: Float64Array): void {
  const N = nn;
  const low = 0;
  const high = nn - 1;
  let i: number, j: number, k: number, z: number;
  for (i = 0; i < nn; i++) {
    if (i < low || i > high) {
      for (j = i; j < nn; j++) {
        V[i * N + j] = H[i * N + j]!;
      }
    }
  }

  for (j = nn - 1; j >= low; j--) {
    for (i = low; i <= high; i++) {
      z = 0;
      for (k = low; k <= Math.min(j, high); k++) {
        z = z + V[i * N + k]! * H[k * N + j]!;
      }
      V[i * N + j] = z;
    }
  }
}

/** Complex division (xr + i xi) / (yr + i yi), left in quotientRe, quotientIm (no allocation). */
let quotientRe = 0;
let quotientIm = 0;

function cdiv(xr: number, xi: number, yr: number, yi: number): void {
  let r: number, d: number;
  if (Math.abs(yr) > Math.abs(yi)) {
    r = yi / yr;
    d = yr + r * yi;
    quotientRe = (xr + r * xi) / d;
    quotientIm = (xi - r * xr) / d;
  } else {
    r = yr / yi;
    d = yi + r * yr;
    quotientRe = (r * xr + xi) / d;
    quotientIm = (r * xi - xr) / d;
  }
}

/**
 * Run the solver's branches once at load, on matrices that need them (a cyclic permutation
 * needs the exceptional shifts; zero, defective and diagonal blocks the early exits; a few
 * fixed pseudo-random matrices of 2 to 8 rows the rest), so the JIT has seen them before it
 * first compiles the solver. Without this the first optimised code of a sweep lacked a branch
 * not yet taken and was thrown away and compiled again when one was, while the sweep waited
 * in the interpreter. Takes well under a millisecond; no result is kept.
 */
function warmUp(): void {
  const cases: number[][] = [
    [0, 0, 1, 1, 0, 0, 0, 1, 0],
    [0, 0, 0, 1, 1, 0, 0, 0, 0, 1, 0, 0, 0, 0, 1, 0],
    [0, 0, 0, 0],
    [1, 1, 0, 1],
    [2, 0, 0, 3],
    [3, 0, 0, 2],
  ];
  let seed = 12345;
  const next = () => {
    seed = (seed * 1103515245 + 12345) % 2147483648;
    return seed / 1073741824 - 1;
  };
  for (let n = 2; n <= 8; n += 1) {
    for (let k = 0; k < 6; k += 1) cases.push(Array.from({ length: n * n }, next));
  }
  for (const a of cases) {
    realEigen(a, Math.round(Math.sqrt(a.length)));
    realEigenvalues(a, Math.round(Math.sqrt(a.length)));
  }
}
warmUp();
