/**
 * Clackwater's hydraulics engine: every calculation the ram-pump job needs,
 * in SI units, with worked steps and warnings. Framework-free.
 */
export { ENGINE_VERSION } from './version';
export * from './errors';
export * from './steps';
export * from './warnings';
export * from './units';
export * from './water';
export * from './pipes';
export * from './fittings';
export * from './pipeSchemas';
export * from './friction';
export * from './transients';
export * from './efficiency';
export * from './ramCycle';
export * from './pumpSizes';
export * from './weirs';
export * from './demandRates';
export * from './stallCauses';
export { parseInput, siNumber } from './schemaKit';
export * from './yieldEstimate';
export * from './arrayPlanner';
export * from './parallelPumps';
export * from './drivePipeCheck';
export * from './deliveryLine';
export * from './sourceFlow';
export * from './demandAndStorage';
export * from './stallCheck';
