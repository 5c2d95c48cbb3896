/**
 * Whether a value survives JSON text unchanged: JSON.parse(JSON.stringify(x)) deep-equals x.
 * Not so for undefined, non-finite numbers (written as null), -0 (written as 0), and anything
 * but plain data. Workers send a condition as JSON text only when this holds, else as a
 * structured clone, so the main thread always gets exactly what the serial path computes.
 */
export function isJsonSafe(value: unknown): boolean {
  switch (typeof value) {
    case 'string':
    case 'boolean':
      return true;
    case 'number':
      return Number.isFinite(value) && !(value === 0 && 1 / value < 0);
    case 'object': {
      if (value === null) return true;
      if (Array.isArray(value)) {
        for (let i = 0; i < value.length; i += 1) if (!(i in value) || !isJsonSafe(value[i])) return false;
        return true;
      }
      const proto = Object.getPrototypeOf(value) as unknown;
      if (proto !== Object.prototype && proto !== null) return false;
      for (const key in value) if (!isJsonSafe((value as Record<string, unknown>)[key])) return false;
      return true;
    }
    default:
      return false;
  }
}
