import type { HTMLAttributes, ReactNode, TdHTMLAttributes, ThHTMLAttributes } from 'react';
import { ScrollFrame } from './scroll-frame';

/** Plain semantic table parts with Leeway's styling; numbers align right in tabular figures. */
export function Table({ caption, children, className = '' }: { caption?: string; children: ReactNode; className?: string }) {
  return (
    <ScrollFrame label={caption ?? 'Table'} className={`relative overflow-x-auto rounded-card border border-line bg-paper-raised shadow-card ${className}`}>
      <table className="w-full border-collapse text-left text-body">
        {caption ? <caption className="sr-only">{caption}</caption> : null}
        {children}
      </table>
    </ScrollFrame>
  );
}

export function Th({ numeric, className = '', ...rest }: ThHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean }) {
  return (
    <th
      scope="col"
      className={`border-b border-line bg-paper-sunk px-4 py-2 text-caption font-semibold uppercase tracking-wide text-ink-soft ${numeric ? 'text-right' : ''} ${className}`}
      {...rest}
    />
  );
}

export function Td({ numeric, className = '', ...rest }: TdHTMLAttributes<HTMLTableCellElement> & { numeric?: boolean }) {
  return <td className={`border-b border-line px-4 py-2 align-middle ${numeric ? 'figures whitespace-nowrap text-right' : ''} ${className}`} {...rest} />;
}

export function Tr(props: HTMLAttributes<HTMLTableRowElement>) {
  return <tr className="last:[&>td]:border-b-0" {...props} />;
}
