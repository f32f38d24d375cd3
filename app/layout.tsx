import '@fontsource/work-sans/400.css';
import '@fontsource/work-sans/500.css';
import '@fontsource/work-sans/600.css';
import './globals.css';
import type { Metadata } from 'next';
import { connection } from 'next/server';
import type { ReactNode } from 'react';
import { ToastProvider } from '@/components/ui/toast';

export const metadata: Metadata = {
  title: { default: 'Leeway', template: '%s · Leeway' },
  description: 'Leeway values the flexibility inside capital projects.',
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Every page is rendered per request, so each gets the CSP nonce of proxy.ts (a prerendered
  // page would carry scripts without it, and the policy would block them).
  await connection();
  return (
    <html lang="en-GB">
      <body className="min-h-screen">
        <ToastProvider>{children}</ToastProvider>
      </body>
    </html>
  );
}
