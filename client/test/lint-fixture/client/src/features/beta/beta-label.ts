export const betaLabel = 'beta';
