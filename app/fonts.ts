import localFont from 'next/font/local';

// Atkinson Hyperlegible, shipped from the @fontsource package: legible in glare and at a glance.
export const hitchmarkFont = localFont({
  src: [
    {
      path: '../node_modules/@fontsource/atkinson-hyperlegible/files/atkinson-hyperlegible-latin-400-normal.woff2',
      weight: '400',
      style: 'normal',
    },
    {
      path: '../node_modules/@fontsource/atkinson-hyperlegible/files/atkinson-hyperlegible-latin-700-normal.woff2',
      weight: '700',
      style: 'normal',
    },
  ],
  variable: '--font-hitchmark',
  display: 'swap',
});
