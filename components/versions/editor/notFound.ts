/** What a reader is told when a saved sketch is missing or in a workspace they are not in: the same words either way, from the server's 404 page or the editor's failed load. */
export const SKETCH_NOT_FOUND_MESSAGE =
  "This sketch does not exist, or you are not a member of its workspace. Saved sketches belong to a workspace: sign in with an account that is a member of it.";
