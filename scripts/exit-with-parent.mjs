// Loaded with `node --import` into each long-running child of `npm start` / `npm run dev` (local
// services, the app server, next dev). The parent opens an IPC channel to it; when the parent goes
// away in any way, even killed outright (SIGKILL, a crashed terminal), the channel closes and the
// child stops itself the ordinary way (SIGTERM: its own shutdown closes its ports). Without this a
// killed `npm start` leaves the app and the mail/storage fakes holding their ports, and the next
// `npm start` cannot bind them.
const stopSelf = () => process.kill(process.pid, "SIGTERM");
if (typeof process.send === "function") {
  // the parent may already be gone before this runs (its channel closed while this file loaded)
  if (!process.connected) stopSelf();
  // (the channel stays referenced: next dev's own server, which inherits this file, ends when unref'd)
  else process.once("disconnect", stopSelf);
}
