import { ping } from './ping';

export const pong = [ping];
