/**
 * Reproducible standard normal draws from a seed: xoroshiro128+ from `pure-rand` for the
 * uniforms, turned into normals by the Box–Muller transform (Box & Muller 1958). The same seed
 * always gives the same sequence, so a stored simulation can be re-run exactly.
 */
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

export function normalDraws(seed: number): () => number {
  const rng = xoroshiro128plus(seed);
  let spare: number | null = null;
  return () => {
    if (spare !== null) {
      const z = spare;
      spare = null;
      return z;
    }
    // 1 − u keeps the logarithm's argument in (0, 1]: uniformFloat64 can return 0, never 1.
    const u = 1 - uniformFloat64(rng);
    const v = uniformFloat64(rng);
    const radius = Math.sqrt(-2 * Math.log(u));
    spare = radius * Math.sin(2 * Math.PI * v);
    return radius * Math.cos(2 * Math.PI * v);
  };
}
