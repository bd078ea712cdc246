// Booth links, the booth view and the procedure sheet's data (issue #6).
export {
	boothPath,
	boothUrl,
	BOOTH_TOKEN,
	ensureBoothLink,
	issueBoothLink,
	newBoothToken,
	revokeBoothLink
} from './links';
export { boothLimiter, flushLookups, logLookup, LOOKUP_WINDOW_MS, lookupCounts } from './lookups';
export { resolveBoothToken, type BoothStatus } from './resolve';
export { currentSheets, defaultPaper, PAPERS, sheetFor, type Paper } from './sheet-data';
export { NO_WELDER, tapContinuity } from './tap';
export { MAX_TAP_AGE_DAYS, receiveTap, type TapAnswer } from './queued-tap';
export { memberView, type BoothMemberView } from './view';
export { linksOfProcedure, currentBoothLinks } from './overview';
