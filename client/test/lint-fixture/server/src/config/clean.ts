export const cleanConfig = { port: 3000 };
