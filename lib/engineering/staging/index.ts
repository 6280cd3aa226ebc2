// Enrichment staging: the physics model (model.ts), the pressure sweep (sweep.ts), the balance between the
// sides (balance.ts) and a proposal of boost-valve setpoints and areas (proposal.ts, searching in search.ts).

export {
  jetBankArea,
  predictedMixtureAt,
  sideCounts,
  suppliedAreaAt,
  targetAfrAt,
  valveIsOpen,
  valveIsOpenJustBelow,
  valveOpeningGaugePa,
  venturiAirAt,
  type BoostPowerValve,
  type CarburetorSide,
  type ChargeTemperatureModel,
  type JetBank,
  type PowerValve,
  type StagingModel,
  type TargetAfrCurve,
  type TargetMixture,
  type ThrottleMode,
  type VacuumPowerValve,
  type VenturiAir,
} from "./model";
export { sweepStaging, type MixtureCurve, type MixtureZone, type StagingSweep, type StagingSweepOptions } from "./sweep";
export { stagingBalance, type StagingBalance, type StagingStage } from "./balance";
export { proposeStaging, type ProposedBoostValve, type StagingProposal, type StagingProposalInput } from "./proposal";
