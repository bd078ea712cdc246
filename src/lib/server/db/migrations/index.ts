import type { QueryInterface } from 'sequelize';
import * as foundation from './0001-foundation';
import * as apiTokens from './0002-api-tokens';
import * as settingsRecords from './0003-settings-records';
import * as procedures from './0004-procedures';
import * as welders from './0005-welders';
import * as boothLinks from './0006-booth-links';
import * as recordsFilterIndex from './0007-records-filter-index';
import * as sharedState from './0008-shared-state';
import * as recordsSearch from './0009-records-search';
import * as continuityTaps from './0010-continuity-taps';
import * as governingCode from './0011-governing-code';
import * as jobs from './0012-jobs';
import * as jobDrawings from './0013-job-drawings';
import * as shopTimeZone from './0015-shop-time-zone';

export interface Migration {
	name: string;
	up(params: { context: QueryInterface }): Promise<void>;
	down(params: { context: QueryInterface }): Promise<void>;
}

// Listed by hand (not globbed) so the same list runs under Vite, vitest and plain tsx scripts.
// Append new migrations at the end; never edit one that has shipped.
export const migrations: Migration[] = [
	{ name: '0001-foundation', ...foundation },
	{ name: '0002-api-tokens', ...apiTokens },
	{ name: '0003-settings-records', ...settingsRecords },
	{ name: '0004-procedures', ...procedures },
	{ name: '0005-welders', ...welders },
	{ name: '0006-booth-links', ...boothLinks },
	{ name: '0007-records-filter-index', ...recordsFilterIndex },
	{ name: '0008-shared-state', ...sharedState },
	{ name: '0009-records-search', ...recordsSearch },
	{ name: '0010-continuity-taps', ...continuityTaps },
	{ name: '0011-governing-code', ...governingCode },
	{ name: '0012-jobs', ...jobs },
	{ name: '0013-job-drawings', ...jobDrawings },
	{ name: '0015-shop-time-zone', ...shopTimeZone }
];
