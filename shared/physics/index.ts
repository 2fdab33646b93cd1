export { BOLTZMANN_J_PER_K, GRAVITY_MPerS2, UNIT_DENSITY_kgPerM3 } from './constants';
export { airProperties, sutherlandViscosity, REFERENCE_AIR, STANDARD_AIR } from './air';
export type { AirConditions, AirProperties } from './air';
export { slipCorrection, HINDS_SLIP, ALLEN_RAABE_SLIP } from './slip';
export type { SlipCoefficients } from './slip';
export { stokesSettlingVelocity, settlingVelocity, relaxationTime, dragFactor } from './settling';
export { particleReynolds } from './reynolds';
export { diffusionCoefficient, rmsDisplacement } from './diffusion';
export { aerodynamicDiameter, physicalDiameter } from './aerodynamic';
export { erfc, erfcx, normalCdf, normalQuantile } from './normal';
export { inhalableFraction, thoracicFraction, respirableFraction, conventionFraction } from './conventions';
export type { SamplingConvention } from './conventions';
export { hatchChoate, conventionMassFraction } from './lognormal';
export type { HatchChoateDiameters } from './lognormal';
export { HOOD_FIT_COEFFICIENT, OPENING_DISTANCE_FACTOR, hoodCenterlineVelocity, hoodRequiredAirflow } from './hoods';
export type { Hood, HoodGeometry, HoodKind } from './hoods';
export { captureVelocityRange } from './capture-velocity';
export type { CaptureVelocityRange, ReleaseCondition } from './capture-velocity';
export { wellMixedConcentration, settlingLossRate, airChangesPerHour } from './well-mixed';
export type { WellMixedRoom } from './well-mixed';
export { nearFieldFarField } from './near-far-field';
export type { NearFarFieldModel, NearFarFieldConcentration } from './near-far-field';
export {
  eddyContinuousSource,
  eddyPuff,
  eddyDiffusivityFromVentilation,
  roomEddyDiffusivity,
  MEASURED_ROOM_DIFFUSIVITY_m2PerS,
} from './eddy';
export type { ContinuousSource, Puff, ReflectingBoundary, RoomDiffusivity } from './eddy';
export { timeWeightedAverage, exposureRatingCategory, bannerFor } from './exposure';
export type { ExposureRating, ExposureSegment } from './exposure';
export type { Banner } from '../vocabulary/fractions';
export { sinkPanelVelocity } from './sink-panel';
export { hoodFace } from './hood-face';
export type { HoodFace } from './hood-face';
export { jetCentrelineSpeed, jetHalfWidth, jetVelocity, jetVolumeFlux } from './round-jet';
export { JET_DECAY_CONSTANT, JET_SPREADING_RATE } from './round-jet';
export type { RoundJet } from './round-jet';
export { JET_EDDY_VISCOSITY_RATIO, jetDiffusivityAndGradient, jetEddyDiffusivity } from './jet-diffusivity';
export { depositionIntegral, depositionVelocities } from './surface-deposition';
export type { DepositionVelocities } from './surface-deposition';
export { absorptionProbability, roomDepositionRate } from './room-deposition';
export type { RoomSurfaces } from './room-deposition';
export { massOutsideRange } from './size-range';
export type { MassLeftOut } from './size-range';
