// The words every result screen and calc sheet carries. One source, so they never drift apart.

export const CAUTION_SHORT =
  "For design checking only. Results must be reviewed by a qualified engineer; local codes, standards and licensed practice govern.";

export const CAUTIONS: readonly string[] = [
  "Results are for design checking of a rigid-body, steady-flow model.",
  "They must be reviewed by a qualified engineer before anything is built or operated from them.",
  "Local codes, standards and licensed engineering practice govern over anything shown here.",
  "Steady-flow loads are not the worst case: start-up, valve closure (water hammer), surge and jet impingement can exceed them.",
];

/**
 * The conventions a checker needs to redo the sheet by hand: axes and signs, what the reaction
 * tables give, how an indeterminate body shares its load, and what the factors count.
 */
/** What the flow factor leaves alone, said where it is set (a case's "Flow ×", the Sweep tab) and in
 *  the calc sheet's method. */
export const FLOW_FACTOR_PRESSURES = "The flow factor scales mass flows (and velocities), not port gauge pressures: those are as entered; write them as expressions of a parameter if they change with flow.";

export const CONVENTIONS: readonly string[] = [
  "Axes as drawn: x to the right, y up, lengths from the sketch's origin (the sketch is drawn in m; a sheet in US customary units gives them in ft too, and its hand check in ft); angles in degrees, counter-clockwise from +x. Moments are positive counter-clockwise.",
  "Reaction tables give the force of each support on the body; the load on the support is equal and opposite. At a contact or roller, n is the component along its normal (positive: pressing on the body) and t the component along the normal turned 90° counter-clockwise.",
  "The hand check takes moments about the point its ΣM line names: a body's first support (its centre of gravity when it has none), as the results panel does; a fixed support's couple is in its row's moment, with the moment of its force.",
  "A statically indeterminate body shares its load by support stiffness: each support is a spring of the stiffness given, or the mean of those given, or 1 GN/m (10^9 N/m); a friction contact's tangential spring is as stiff as its normal one; a fixed support's rotational stiffness is k·d², d the diagonal of the body's bounding box.",
  "A body's mass is everything inside its control volume, the fluid in it included; its weight acts at its centre of gravity.",
  "A mass source adds mass inside the control volume with no momentum and no pressure force of its own: it counts in the mass balance only.",
  "A case's flow factor f scales every port's ṁ and V (momentum flux × f²); gauge pressures stay as given unless the case sets them.",
  "Factors of safety count each component of a load apart (the across-base and along-base parts of a jet or a port's p·A and ṁV): a load that overturns in one part and restores in another is not netted, which is conservative.",
];

export const ASSUMPTIONS: readonly string[] = [
  "Rigid body; supports are stiff springs (their stiffness only matters when the supports are statically indeterminate).",
  "Steady flow through a control volume fixed to the body; flow is normal to each port face and uniform across it unless the port gives a momentum-flux factor β.",
  "Port pressures are gauge pressures; the surroundings are at ambient pressure.",
  "No friction unless a coefficient is given on a contact.",
  "Small displacements: geometry is taken as drawn.",
];
