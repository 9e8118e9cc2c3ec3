export const clean = 1;
