// Deliberately wrong: the ground floor importing a feature.
import { sacClock } from '../sacs/sac-clock';

export const readsFeature = () => sacClock();
