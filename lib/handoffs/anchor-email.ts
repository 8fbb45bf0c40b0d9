// The daily anchor's e-mail to a terminal's managers, in each manager's language. Pure.
import { translatorFor } from '@/lib/i18n/translate';

export type AnchorEmailFacts = {
  id: string;
  terminal: { code: string; name: string };
  day: string;
  digest: string;
  trailers: number;
  records: number;
  /** The anchors page, where the digest is checked again. */
  url: string;
};

export function anchorEmail(locale: string, f: AnchorEmailFacts) {
  const t = translatorFor(locale, 'Mail');
  return {
    subject: t('anchor.subject', { terminal: f.terminal.code, day: f.day, digest: f.digest.slice(0, 16) }),
    text: [
      t('anchor.intro', { code: f.terminal.code, name: f.terminal.name, day: f.day }),
      '',
      t('anchor.digest', { trailers: f.trailers, records: f.records }),
      f.digest,
      '',
      t('anchor.keep'),
      t('anchor.page', { url: f.url }),
      t('anchor.rewritten'),
    ].join('\n'),
    relatedType: 'anchor',
    relatedId: f.id,
  };
}
