// The words every result screen and calc sheet carries. One source, so they never drift apart.

export const CAUTION_SHORT =
  "For design checking only. Results must be reviewed by a qualified engineer; local codes, standards and licensed practice govern.";

export const CAUTIONS: readonly string[] = [
  "Results are for design checking of a rigid-body, steady-flow model.",
  "They must be reviewed by a qualified engineer before anything is built or operated from them.",
  "Local codes, standards and licensed engineering practice govern over anything shown here.",
  "Steady-flow loads are not the worst case: start-up, valve closure (water hammer), surge and jet impingement can exceed them.",
];

export const ASSUMPTIONS: readonly string[] = [
  "Rigid body; supports are stiff springs (their stiffness only matters when the supports are statically indeterminate).",
  "Steady flow through a control volume fixed to the body; flow is normal to each port face and uniform across it unless the port gives a momentum-flux factor β.",
  "Port pressures are gauge pressures; the surroundings are at ambient pressure.",
  "No friction unless a coefficient is given on a contact.",
  "Small displacements: geometry is taken as drawn.",
];
