import type { FeatureSeeder } from './demo-seed';
import { seedCollection } from './collection.seeder';
import { seedProjects } from './projects.seeder';

/** The scenario's parts, in dependency order; each feature adds its seeder here. */
export const DEMO_SEEDERS: FeatureSeeder[] = [seedCollection, seedProjects];
