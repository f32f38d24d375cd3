/** The lattice parameterisations by name, as the settings and the documents print them (docs/engine.md §3). */
import type { TreeKind } from '@/lattice';

export const treeLabels: Record<TreeKind, string> = {
  crr: 'Cox–Ross–Rubinstein (1979)',
  'jarrow-rudd': 'Jarrow–Rudd (equal probabilities)',
  tian: 'Tian (1993, third moment)',
  trigeorgis: 'Trigeorgis (1991, log-transformed)',
};
