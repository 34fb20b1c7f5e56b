/** Beam flight through a real (non-uniform) field: the public surface of this folder. */
export { sublevelCurves, NODES_PER_SCALE, type CurveOptions, type SublevelCurveLabel, type SublevelCurves } from './sublevelCurves';
export { flySublevel, ADIABATIC_LIMIT, type Flight, type FlightOptions, type FlightSetup, type TransverseState } from './flight';
export { directionTurnRate, magnitudeAndGradient } from './fieldMagnitude';
export { dormandPrince, rungeKutta4, type Derivative, type Observer, type StepperResult } from './steppers';
export { surveyBeamLine, GRADIENT_VARIATION_LIMIT, MIN_CLEARANCE_M, type BeamLineSurvey, type SurveyInput } from './beamLineSurvey';
export { fieldMapBeam, FORWARD_ENERGY_LIMIT, INVERSE_SQUARE_LIMIT, type FieldMapBeam, type FieldMapInput, type FieldMapSublevel } from './fieldMapBeam';
export { effectiveMomentJT, fieldMapPattern, END_FRACTIONS, type FieldMapPatternInput } from './fieldMapPattern';
export { closestApproach, distanceToSource } from './lineClearance';
export { CoefficientFlyer, type CoefficientFlights, type CoefficientSetup } from './coefficientFlights';
export { coefficientSlopes, LINEARITY_LIMIT, type CoefficientNudge, type CoefficientSlope, type FlightChange } from './coefficientSlopes';
