import { palette } from '@/lib/palette';
/** Leeway's wordmark: a small lattice glyph (one node branching up and down) and the name. */
export function Wordmark({ compact = false }: { compact?: boolean }) {
  return (
    <span className="inline-flex items-center gap-2 text-ink" aria-label="Leeway">
      <svg width={compact ? 22 : 28} height={compact ? 22 : 28} viewBox="0 0 28 28" aria-hidden>
        <path
          d="M4 14 L14 6 L24 2 M14 6 L24 10 M4 14 L14 22 L24 18 M14 22 L24 26"
          stroke={palette.tide[500]}
          strokeWidth="2"
          fill="none"
          strokeLinecap="round"
        />
        <circle cx="4" cy="14" r="3" fill={palette.ink.DEFAULT} />
        <circle cx="14" cy="6" r="2.5" fill={palette.tide[500]} />
        <circle cx="14" cy="22" r="2.5" fill={palette.tide[500]} />
      </svg>
      {compact ? null : <span className="text-title tracking-tight">Leeway</span>}
    </span>
  );
}
