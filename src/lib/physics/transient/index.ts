/**
 * Transient physics for surge screening: liquid bulk modulus, pipe-wall elasticity, wave speed
 * (Korteweg form with restraint factors) and the hand formulas (Joukowsky, 2L/a, slow closure).
 */
export * from './bulkModulus';
export * from './pipeElasticity';
export * from './waveSpeed';
export * from './quickScreen';
