import type { FeatureSeeder } from './demo-seed';

/** The scenario's parts, in dependency order; each feature adds its seeder here. */
export const DEMO_SEEDERS: FeatureSeeder[] = [];
