// One entry for the sheet bench, so Vite loads the sheet, the qualification card, their fixtures
// and the font counter as one module graph (the counter must be the instance the sheet uses).
export { procedureSheetPdf, procedureSheetsPdf } from '../../src/lib/server/pdf/procedure-sheet';
export { fixtureSheet } from '../../src/lib/server/pdf/sheet-fixture';
export { fontParses } from '../../src/lib/server/pdf/font-cache';
export { qualificationCardPdf } from '../../src/lib/server/pdf/qualification-card';
export { fixtureCard } from '../../src/lib/server/pdf/card-fixture';
