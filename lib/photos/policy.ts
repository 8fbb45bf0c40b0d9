// How a photo is shrunk on the phone before it leaves (browser-image-compression). A terminal sets
// both figures in its policy (lib/terminal/policy.ts); these are the defaults.

export type PhotoPolicy = {
  /** Longest side of the uploaded picture, in pixels. */
  longestSidePx: number;
  /** JPEG quality, 0 to 1. */
  quality: number;
};

/**
 * common practice: 1600 px on the longest side at JPEG quality 0.8 keeps a dent, a tear or a
 * tread depth legible when zoomed on a desk screen, at a few hundred kilobytes, which one bar of
 * signal can carry.
 */
export const DEFAULT_PHOTO_POLICY: PhotoPolicy = { longestSidePx: 1600, quality: 0.8 };

/** Photo bounds a terminal may set: at least 800 px (smaller hides damage), at most 4096. */
export const PHOTO_SIDE_BOUNDS = { min: 800, max: 4096 } as const;
export const PHOTO_QUALITY_BOUNDS = { min: 0.5, max: 1 } as const;
