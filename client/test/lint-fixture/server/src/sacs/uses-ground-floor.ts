// Fine: a feature building on the ground floor.
import { cleanConfig } from '../config/clean';

export const usesGroundFloor = () => cleanConfig.port;
