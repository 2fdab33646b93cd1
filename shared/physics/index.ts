export { BOLTZMANN_J_PER_K, GRAVITY_MPerS2, UNIT_DENSITY_kgPerM3 } from './constants';
export { airProperties, sutherlandViscosity, REFERENCE_AIR, STANDARD_AIR, type AirConditions, type AirProperties } from './air';
export { slipCorrection, HINDS_SLIP, ALLEN_RAABE_SLIP, type SlipCoefficients } from './slip';
export { stokesSettlingVelocity, settlingVelocity, relaxationTime, dragFactor } from './settling';
export { particleReynolds } from './reynolds';
export { diffusionCoefficient, rmsDisplacement } from './diffusion';
export { aerodynamicDiameter, physicalDiameter } from './aerodynamic';
export { erfc, erfcx, normalCdf, normalQuantile } from './normal';
export { inhalableFraction, thoracicFraction, respirableFraction, conventionFraction, type SamplingConvention } from './conventions';
export { hatchChoate, conventionMassFraction, type HatchChoateDiameters } from './lognormal';
export {
  HOOD_FIT_COEFFICIENT,
  OPENING_DISTANCE_FACTOR,
  hoodCenterlineVelocity,
  hoodRequiredAirflow,
  type Hood,
  type HoodGeometry,
  type HoodKind,
} from './hoods';
export { captureVelocityRange, type CaptureVelocityRange, type ReleaseCondition } from './capture-velocity';
export { wellMixedConcentration, settlingLossRate, airChangesPerHour, type WellMixedRoom } from './well-mixed';
export { nearFieldFarField, type NearFarFieldModel, type NearFarFieldConcentration } from './near-far-field';
export {
  eddyContinuousSource,
  eddyPuff,
  eddyDiffusivityFromVentilation,
  roomEddyDiffusivity,
  MEASURED_ROOM_DIFFUSIVITY_m2PerS,
  type ContinuousSource,
  type Puff,
  type ReflectingBoundary,
  type RoomDiffusivity,
} from './eddy';
export { timeWeightedAverage, exposureRatingCategory, bannerFor, type ExposureRating, type ExposureSegment } from './exposure';
export type { Banner } from '../vocabulary/fractions';
export { sinkPanelVelocity } from './sink-panel';
export { hoodFace, type HoodFace } from './hood-face';
export {
  jetCentrelineSpeed,
  jetHalfWidth,
  jetVelocity,
  jetVolumeFlux,
  JET_DECAY_CONSTANT,
  JET_SPREADING_RATE,
  type RoundJet,
} from './round-jet';
export { JET_EDDY_VISCOSITY_RATIO, jetDiffusivityAndGradient, jetEddyDiffusivity } from './jet-diffusivity';
export { depositionIntegral, depositionVelocities, type DepositionVelocities } from './surface-deposition';
export { absorptionProbability, roomDepositionRate, type RoomSurfaces } from './room-deposition';
export { massOutsideRange, type MassLeftOut } from './size-range';
