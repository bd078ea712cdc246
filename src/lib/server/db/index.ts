export { sequelize } from './sequelize';
export { write } from './write-queue';
export { migrate } from './migrate';
export { checkDatabase, DatabaseConfigError, exitOnConfigError } from './connect';
