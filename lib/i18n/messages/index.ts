import type { Locale } from '@/lib/i18n/locales';
// One JSON file per namespace and language, so screens can be translated in parallel without
// everyone editing one big file. Add a namespace: one file in en/, one in es/, one line in each list.
import enAccount from './en/Account.json';
import enGate from './en/Gate.json';
import enLanguage from './en/Language.json';
import enLogin from './en/Login.json';
import enOffline from './en/Offline.json';
import enPhotos from './en/Photos.json';
import enReasons from './en/Reasons.json';
import enShell from './en/Shell.json';
import enTheme from './en/Theme.json';
import esAccount from './es/Account.json';
import esGate from './es/Gate.json';
import esLanguage from './es/Language.json';
import esLogin from './es/Login.json';
import esOffline from './es/Offline.json';
import esPhotos from './es/Photos.json';
import esReasons from './es/Reasons.json';
import esShell from './es/Shell.json';
import esTheme from './es/Theme.json';

const en = {
  Account: enAccount,
  Gate: enGate,
  Language: enLanguage,
  Login: enLogin,
  Offline: enOffline,
  Photos: enPhotos,
  Reasons: enReasons,
  Shell: enShell,
  Theme: enTheme,
};

/** The English catalogue's shape is the one every language must match (the unit test checks keys). */
export type Messages = typeof en;

export const MESSAGES: Record<Locale, Messages> = {
  en,
  es: {
    Account: esAccount,
    Gate: esGate,
    Language: esLanguage,
    Login: esLogin,
    Offline: esOffline,
    Photos: esPhotos,
    Reasons: esReasons,
    Shell: esShell,
    Theme: esTheme,
  },
};
