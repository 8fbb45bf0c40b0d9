'use client';
// The signed-in user's terminal photo policy, handed down from the shell so every PhotoCapture
// (gate form, desk dispute) shrinks to the terminal's figures without each page passing them.
import { createContext, useContext } from 'react';
import { DEFAULT_PHOTO_POLICY, type PhotoPolicy } from '@/lib/photos/policy';

const PhotoPolicyContext = createContext<PhotoPolicy>(DEFAULT_PHOTO_POLICY);

export function PhotoPolicyProvider({
  policy,
  children,
}: {
  policy: PhotoPolicy;
  children: React.ReactNode;
}) {
  return <PhotoPolicyContext.Provider value={policy}>{children}</PhotoPolicyContext.Provider>;
}

export function usePhotoPolicy(): PhotoPolicy {
  return useContext(PhotoPolicyContext);
}
