// Deliberately wrong: ping and pong import each other.
import { pong } from './pong';

export const ping = (): string => `ping ${pong.length}`;
