import 'server-only';
// Trailer labels: links and tokens, resolving a scanned token, re-issuing a label, preparing a sheet.
export { labelLink, labelToken } from './links';
export { reissueLabel } from './reissue';
export { resolveLabelToken, type LabelResolution } from './resolve';
export { prepareLabelSheet, type SheetTrailer } from './sheet';
