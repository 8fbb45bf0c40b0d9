import type { Locale } from '@/lib/i18n/locales';
// One JSON file per namespace and language, so screens can be translated in parallel without
// everyone editing one big file. Add a namespace: one file in en/, one in es/, one line in each list.
import enGate from './en/Gate.json';
import enYard from './en/Yard.json';
import enWalk from './en/Walk.json';
import enCautions from './en/Cautions.json';
import enLanguage from './en/Language.json';
import enLogin from './en/Login.json';
import enOffline from './en/Offline.json';
import enShell from './en/Shell.json';
import enTheme from './en/Theme.json';
import esGate from './es/Gate.json';
import esYard from './es/Yard.json';
import esWalk from './es/Walk.json';
import esCautions from './es/Cautions.json';
import esLanguage from './es/Language.json';
import esLogin from './es/Login.json';
import esOffline from './es/Offline.json';
import esShell from './es/Shell.json';
import esTheme from './es/Theme.json';

const en = {
  Yard: enYard,
  Walk: enWalk,
  Cautions: enCautions,
  Gate: enGate,
  Language: enLanguage,
  Login: enLogin,
  Offline: enOffline,
  Shell: enShell,
  Theme: enTheme,
};

/** The English catalogue's shape is the one every language must match (the unit test checks keys). */
export type Messages = typeof en;

export const MESSAGES: Record<Locale, Messages> = {
  en,
  es: {
    Yard: esYard,
    Walk: esWalk,
    Cautions: esCautions,
    Gate: esGate,
    Language: esLanguage,
    Login: esLogin,
    Offline: esOffline,
    Shell: esShell,
    Theme: esTheme,
  },
};
