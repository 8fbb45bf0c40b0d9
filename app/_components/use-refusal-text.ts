'use client';

import { useTranslations } from 'next-intl';
import { useCallback } from 'react';
import { localizeRefusal, type RefusalKey } from '@/lib/i18n/refusals';

/**
 * Says an HTTP refusal in the reader's language: by its `messageKey` when the API sent one,
 * else by matching the English message against the `Refusals` catalogue; unknown ones unchanged.
 */
export function useRefusalText() {
  const t = useTranslations('Refusals');
  return useCallback(
    (message: string, key?: unknown, values?: unknown): string => {
      if (typeof key === 'string' && t.has(key as RefusalKey))
        return t(key as RefusalKey, (values ?? {}) as Record<string, string>);
      return localizeRefusal(message, (k, v) => t(k, v));
    },
    [t],
  );
}
