import type { MetadataRoute } from 'next';

// Installable on a phone's home screen: opens full-screen on the gate or yard a person last used.
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: 'Hitchmark',
    short_name: 'Hitchmark',
    description: 'Trailer handoffs, yard board and damage cases for a reefer terminal.',
    start_url: '/',
    scope: '/',
    display: 'standalone',
    orientation: 'portrait',
    background_color: '#0b0f14',
    theme_color: '#0b5c8a',
    icons: [
      { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
      { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
      { src: '/icons/icon-maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
    ],
  };
}
