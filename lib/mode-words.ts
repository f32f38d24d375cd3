/**
 * The engine's operating modes in words for the lattice view: its ids ("operating+Phase 2
 * (Mothball)", "closed", "waiting") are built from the rights exercised so far
 * (lattice/compile-templates.ts); people read "Operating, after Phase 2, Mothball in force".
 */
export function modeLabel(id: string): string {
  if (id === 'closed') return 'Closed (sold or abandoned)';
  if (id === 'waiting') return 'Not built yet (waiting to invest)';
  if (!id.startsWith('operating')) return id;
  const switched = id.match(/ \(([^()]+)\)$/);
  const exercised = (switched ? id.slice(0, switched.index) : id).split('+').slice(1);
  return ['Operating', exercised.length > 0 ? `after ${exercised.join(' and ')}` : null, switched ? `${switched[1]} in force` : null]
    .filter(Boolean)
    .join(', ');
}
