export { sequelize } from './sequelize';
export { write } from './write-queue';
export { migrate } from './migrate';
