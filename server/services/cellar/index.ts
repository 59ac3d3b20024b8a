/**
 * The cellar, by what each part owns: vessels, the batch's cellar plan, logged cellar actions and the
 * screens that show them (the batch's cellar page and the vessel board).
 */
export { listVessels, createVessel, updateVessel, markVesselClean, deleteVessel } from './vessels';
export { saveCellarPlan } from './plans';
export { carbonationFor, recordAction } from './actions';
export { batchCellar, vesselBoard } from './board';
