// Settings records: every service takes the acting member and stays inside the member's shop.
export { canEdit, CREATE_ROLES, isFrozen, VIEW_ROLES } from './access';
export { compareIds, compareRecords, COMPARE_MAX } from './compare';
export { recordsCsv } from './csv';
export { recordJson } from './json';
export { authorNames, fillersInUse } from './choices';
export { listRecords, PAGE_SIZE, plotPoints, walkInOrder } from './list';
export { MAX_PHOTOS, photosFrom } from './photos';
export { getRecord, recordHistory, type RecordView } from './read';
export {
	createRecord,
	findOwn,
	freezeRecord,
	removePhoto,
	requireEditable,
	updateRecord
} from './save';
