import type { Locale } from '@/lib/i18n/locales';
// One JSON file per namespace and language, so screens can be translated in parallel without
// everyone editing one big file. Add a namespace: one file in en/, one in es/, one line in each list.
import enAccount from './en/Account.json';
import enGate from './en/Gate.json';
import enHandoff from './en/Handoff.json';
import enRefusals from './en/Refusals.json';
import enCommon from './en/Common.json';
import enErrors from './en/Errors.json';
import enLabel from './en/Label.json';
import enCaseLink from './en/CaseLink.json';
import enVerify from './en/Verify.json';
import enAdmin from './en/Admin.json';
import enTrailers from './en/Trailers.json';
import enDesk from './en/Desk.json';
import enCase from './en/Case.json';
import enYard from './en/Yard.json';
import enWalk from './en/Walk.json';
import enCautions from './en/Cautions.json';
import enLanguage from './en/Language.json';
import enLogin from './en/Login.json';
import enOffline from './en/Offline.json';
import enPhotos from './en/Photos.json';
import enReasons from './en/Reasons.json';
import enShell from './en/Shell.json';
import enTheme from './en/Theme.json';
import enTrailerFilePages from './en/TrailerFilePages.json';
import enYardRows from './en/YardRows.json';
import enMail from './en/Mail.json';
import enChecklist from './en/Checklist.json';
import esAccount from './es/Account.json';
import esGate from './es/Gate.json';
import esHandoff from './es/Handoff.json';
import esRefusals from './es/Refusals.json';
import esCommon from './es/Common.json';
import esErrors from './es/Errors.json';
import esLabel from './es/Label.json';
import esCaseLink from './es/CaseLink.json';
import esVerify from './es/Verify.json';
import esAdmin from './es/Admin.json';
import esTrailers from './es/Trailers.json';
import esDesk from './es/Desk.json';
import esCase from './es/Case.json';
import esYard from './es/Yard.json';
import esWalk from './es/Walk.json';
import esCautions from './es/Cautions.json';
import esLanguage from './es/Language.json';
import esLogin from './es/Login.json';
import esOffline from './es/Offline.json';
import esPhotos from './es/Photos.json';
import esReasons from './es/Reasons.json';
import esShell from './es/Shell.json';
import esTheme from './es/Theme.json';
import esTrailerFilePages from './es/TrailerFilePages.json';
import esYardRows from './es/YardRows.json';
import esMail from './es/Mail.json';
import esChecklist from './es/Checklist.json';

const en = {
  Refusals: enRefusals,
  Common: enCommon,
  Errors: enErrors,
  Label: enLabel,
  CaseLink: enCaseLink,
  Verify: enVerify,
  Admin: enAdmin,
  Trailers: enTrailers,
  Desk: enDesk,
  Case: enCase,
  Yard: enYard,
  Walk: enWalk,
  Cautions: enCautions,
  Account: enAccount,
  Gate: enGate,
  Handoff: enHandoff,
  Language: enLanguage,
  Login: enLogin,
  Offline: enOffline,
  Photos: enPhotos,
  Reasons: enReasons,
  Shell: enShell,
  Theme: enTheme,
  TrailerFilePages: enTrailerFilePages,
  YardRows: enYardRows,
  Mail: enMail,
  Checklist: enChecklist,
};

/** The English catalogue's shape is the one every language must match (the unit test checks keys). */
export type Messages = typeof en;

export const MESSAGES: Record<Locale, Messages> = {
  en,
  es: {
    Refusals: esRefusals,
    Common: esCommon,
    Errors: esErrors,
    Label: esLabel,
    CaseLink: esCaseLink,
    Verify: esVerify,
    Admin: esAdmin,
    Trailers: esTrailers,
    Desk: esDesk,
    Case: esCase,
    Yard: esYard,
    Walk: esWalk,
    Cautions: esCautions,
    Account: esAccount,
    Gate: esGate,
    Handoff: esHandoff,
    Language: esLanguage,
    Login: esLogin,
    Offline: esOffline,
    Photos: esPhotos,
    Reasons: esReasons,
    Shell: esShell,
    Theme: esTheme,
    TrailerFilePages: esTrailerFilePages,
    YardRows: esYardRows,
    Mail: esMail,
    Checklist: esChecklist,
  },
};
