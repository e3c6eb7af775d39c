/** Why a CSV is not offered while the result shown is the last good one (a file carries no fading). */
export const STALE_CSV = "The input has errors: the result shown is the last good one, not this sketch's. Put the errors right to download it.";
