import type { Metadata, Viewport } from 'next';
import type { ReactNode } from 'react';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Waygrade — measured condition reports for used lathes', template: '%s · Waygrade' },
  description:
    'Independent, measured inspections of used machine tools: graded condition, repair costs and a valuation you can check.',
};

export const viewport: Viewport = { width: 'device-width', initialScale: 1, themeColor: '#f7f5f0' };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en">
      <body>{children}</body>
    </html>
  );
}
