/** The request header `proxy.ts` puts the asked-for path (with its query) in, for the pages. */
export const PATH_HEADER = "x-counterpoise-path";
