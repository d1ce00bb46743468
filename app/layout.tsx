import '@fontsource/ibm-plex-sans/400.css';
import '@fontsource/ibm-plex-sans/500.css';
import '@fontsource/ibm-plex-sans/600.css';
import './globals.css';
import type { Metadata, Viewport } from 'next';

export const metadata: Metadata = {
  title: { default: 'Pourproof', template: '%s · Pourproof' },
  description: 'Colour matching for soft-plastic bait shops: measured pours, signed-off standards, checked batches.',
};

export const viewport: Viewport = { width: 'device-width', initialScale: 1, themeColor: '#1f5f8b' };

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en">
      <body className="min-h-screen bg-panel text-ink antialiased">{children}</body>
    </html>
  );
}
