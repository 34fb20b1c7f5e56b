/** Field sources: exact B and gradient of loops, solenoids, wires and magnetised blocks, and their sum. */
export * from './types';
export { cel } from './cel';
export { ellipticParts } from './ellipticParts';
export type { FieldIssue } from './issues';
export { loopField } from './loopField';
export { solenoidField } from './solenoidField';
export { wireField } from './wireField';
export { slabField, slabFieldWithRoundOff, type SlabFieldWithRoundOff } from './slabField';
export { partField, sumField, fieldIssuesAt, slabPartWithRoundOff } from './sumField';
export { conductorOf, onSourceIssue, pointOnSource } from './onSource';
export { validateFieldSource } from './validateSource';
export { magnitudeGradient, magnitudeHessian, DEFAULT_CURVATURE_STEP_M, type MagnitudeCurvature } from './curvature';
export { sampleSegment, sampleGrid, MAX_SAMPLES, type GridRequest, type GridSamples, type PointSample, type SegmentSamples } from './sampling';
export { scaledField } from './scaledField';
