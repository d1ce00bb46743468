import type { MetadataRoute } from 'next';

// Lets a maker add Pourproof to the phone's home screen (Web App Manifest, W3C).
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: 'Pourproof',
    short_name: 'Pourproof',
    description: 'Colour matching for soft-plastic bait shops: photos, pours, ΔE00 and sign-off.',
    start_url: '/matches',
    scope: '/',
    display: 'standalone',
    background_color: '#f4f1ec',
    theme_color: '#1f5f8b',
    icons: [
      { src: '/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
      { src: '/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
      { src: '/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
    ],
  };
}
