/** A deterministic generator of numbers in [0, 1) for the given seed (mulberry32). */
export function seeded(seed: number): () => number;
