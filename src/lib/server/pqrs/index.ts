// PQRs: every service takes the acting member and stays inside the member's shop.
export { addAddendum, certifyPqr, CERTIFIED_MESSAGE, createPqr, findPqr, updatePqr } from './save';
export { getPqr, listPqrs, readPqr, type PqrRow, type PqrView } from './read';
export { MAX_REPORT_BYTES, openReport, uploadReport } from './reports';
