import type { FeatureSeeder } from './demo-seed';
import { seedCollection } from './collection.seeder';
import { seedProjects } from './projects.seeder';
import { seedSacs } from './sacs.seeder';
import { seedAccounts } from './accounts.seeder';
import { seedKeptBack } from './kept-back.seeder';

/** The scenario's parts, in dependency order; each feature adds its seeder here. */
// seedAccounts stays last: it reads the counted broods the sacs seeder lays.
export const DEMO_SEEDERS: FeatureSeeder[] = [seedCollection, seedProjects, seedSacs, seedKeptBack, seedAccounts];
