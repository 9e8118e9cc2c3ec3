import type { FeatureSeeder } from './demo-seed';
import { seedCollection } from './collection.seeder';
import { seedProjects } from './projects.seeder';
import { seedSacs } from './sacs.seeder';
import { seedAccounts } from './accounts.seeder';
import { seedKeptBack } from './kept-back.seeder';
import { seedUnhappySeason } from './unhappy-season.seeder';
import { seedMotherKeptBrood } from './mother-kept-brood.seeder';
import { seedPartnerUpdates } from './partner-updates.seeder';

/** The scenario's parts, in dependency order; each feature adds its seeder here. */
// seedAccounts reads the counted broods the sacs seeders lay; the mother-kept brood brings its own terms;
// the partner's updates tell the latest events of all of them.
export const DEMO_SEEDERS: FeatureSeeder[] = [
  seedCollection,
  seedProjects,
  seedSacs,
  seedKeptBack,
  seedUnhappySeason,
  seedAccounts,
  seedMotherKeptBrood,
  seedPartnerUpdates,
];
