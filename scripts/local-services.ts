// Local stand-ins for hosted services, on loopback: started by `npm start`, `npm run dev` and `npm test`.
// Each later service (mail, object storage) registers here.
const services: Array<{ name: string; start: () => Promise<() => Promise<void>> }> = [];

async function main() {
  const stops: Array<() => Promise<void>> = [];
  for (const s of services) stops.push(await s.start());
  const shutdown = async () => {
    for (const stop of stops) await stop().catch(() => undefined);
    process.exit(0);
  };
  process.on("SIGTERM", shutdown);
  process.on("SIGINT", shutdown);
  // Keep running until told to stop.
  setInterval(() => undefined, 1 << 30);
}

main().catch((err) => {
  console.error("[services]", err);
  process.exit(1);
});
