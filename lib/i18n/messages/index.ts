import type { Locale } from '@/lib/i18n/locales';
// One JSON file per namespace and language, so screens can be translated in parallel without
// everyone editing one big file. Add a namespace: one file in en/, one in es/, one line in each list.
import enGate from './en/Gate.json';
import enLanguage from './en/Language.json';
import enLogin from './en/Login.json';
import enOffline from './en/Offline.json';
import enPhotos from './en/Photos.json';
import enShell from './en/Shell.json';
import enTheme from './en/Theme.json';
import esGate from './es/Gate.json';
import esLanguage from './es/Language.json';
import esLogin from './es/Login.json';
import esOffline from './es/Offline.json';
import esPhotos from './es/Photos.json';
import esShell from './es/Shell.json';
import esTheme from './es/Theme.json';

const en = {
  Gate: enGate,
  Language: enLanguage,
  Login: enLogin,
  Offline: enOffline,
  Photos: enPhotos,
  Shell: enShell,
  Theme: enTheme,
};

/** The English catalogue's shape is the one every language must match (the unit test checks keys). */
export type Messages = typeof en;

export const MESSAGES: Record<Locale, Messages> = {
  en,
  es: {
    Gate: esGate,
    Language: esLanguage,
    Login: esLogin,
    Offline: esOffline,
    Photos: esPhotos,
    Shell: esShell,
    Theme: esTheme,
  },
};
