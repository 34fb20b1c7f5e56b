/** Zeeman slowers: the ideal field profile, the driven pair's Zeeman rate, the check of a field design and a 1-D simulation. */
export type { AxisField, CheckSample, DesignCheck, IdealProfile, SimulationResult, SlowerDesign, SlowerIssue, SlowerRequest, SlowerTransition } from './types';
export { maxDeceleration, scatteringDeceleration, slowingLength } from './deceleration';
export { checkRequest, defaultBias, designSign, idealField, idealProfile, idealSpeed } from './idealProfile';
export { drivenPair, rateSpread, type DrivenPair, type PairSide } from './drivenPair';
export { checkDesign, type CheckInput } from './designCheck';
export { simulateAtom, type SimulationInput } from './simulate';
export { slowerCautions, type SlowerCautionSetup } from './cautions';
export { axisField, pointOnAxis, transverseFraction, type SlowerAxis } from './axisField';
