'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

const links = [
  { href: '/settings', label: 'Organisation defaults' },
  { href: '/settings/members', label: 'Members' },
  { href: '/settings/api-keys', label: 'API keys' },
];

export function SettingsNav() {
  const pathname = usePathname();
  return (
    <nav aria-label="Settings" className="mb-6 flex gap-1 border-b border-line">
      {links.map((l) => (
        <Link
          key={l.href}
          href={l.href}
          aria-current={pathname === l.href ? 'page' : undefined}
          className={`-mb-px border-b-2 px-4 py-2 ${pathname === l.href ? 'border-tide-500 font-medium text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`}
        >
          {l.label}
        </Link>
      ))}
    </nav>
  );
}
