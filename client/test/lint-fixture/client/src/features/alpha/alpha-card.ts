// Deliberately wrong: a feature importing another feature.
import { betaLabel } from '../beta/beta-label';

export const alphaCard = () => `alpha ${betaLabel}`;
