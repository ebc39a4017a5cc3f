import { getConfig } from '../config';
import { runMigrations } from './migrate';

await runMigrations(getConfig().DATABASE_URL);
console.log('Migrations applied.');
