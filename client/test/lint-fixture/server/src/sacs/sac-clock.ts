export const sacClock = () => 'now';
