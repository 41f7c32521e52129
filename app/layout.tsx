import type { Metadata, Viewport } from 'next';
import type { ReactNode } from 'react';
import { plexMono, plexSans } from '@/lib/fonts';
import { Providers } from './providers';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Seamline', template: '%s · Seamline' },
  description: 'Crossover, timing, room modes, layout and headroom for making mains and subwoofers play as one system.',
  icons: { icon: '/mark.svg' },
};

export const viewport: Viewport = { width: 'device-width', initialScale: 1, themeColor: '#F6F4EF' };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${plexSans.variable} ${plexMono.variable}`}>
      <body className="min-h-screen antialiased">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
