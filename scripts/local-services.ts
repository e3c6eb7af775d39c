// Local stand-ins for hosted services, on loopback: started by `npm start`, `npm run dev` and `npm test`.
// Each later service (mail, object storage) registers here.
import { localDatabaseUrl } from "../lib/database-url";
import { smtpSettings, storageSettings } from "../lib/env";
import { startS3Fake } from "../lib/local-s3";
import { devMailStore, startMailFake } from "../lib/mail-fake";

const services: Array<{ name: string; start: () => Promise<() => Promise<void>> }> = [
  {
    // Mail: with no SMTP_HOST configured the app sends to this fake; /dev/mailbox lists what arrived.
    name: "mail",
    async start() {
      const smtp = smtpSettings();
      if (smtp.kind === "real") {
        console.error(`[services] SMTP_HOST is set (${smtp.host}): the local mail fake is not started`);
        return async () => undefined;
      }
      const store = devMailStore(process.env.DATABASE_URL || localDatabaseUrl());
      const stop = await startMailFake({ port: smtp.port, host: smtp.host, onMail: store.save });
      console.error(`[services] local SMTP on ${smtp.host}:${smtp.port} (mail listed at /dev/mailbox)`);
      return async () => {
        await stop();
        await store.close();
      };
    },
  },
  {
    // Object storage: with no S3_ENDPOINT configured the app stores uploads in this fake.
    name: "storage",
    async start() {
      const st = storageSettings();
      if (st.kind === "real") {
        console.error(`[services] S3_ENDPOINT is set (${st.endpoint}): the local storage fake is not started`);
        return async () => undefined;
      }
      const directory = `${process.env.COUNTERPOISE_LOCAL_STATE || `/tmp/counterpoise-state-${st.port}`}/s3`;
      const stop = await startS3Fake({ port: st.port, bucket: st.bucket, directory });
      console.error(`[services] local S3 on 127.0.0.1:${st.port} (bucket ${st.bucket}, files in ${directory})`);
      return stop;
    },
  },
];

async function main() {
  const stops: Array<() => Promise<void>> = [];
  for (const s of services) {
    try {
      stops.push(await s.start());
    } catch (err) {
      const reason = err instanceof Error ? err.message : String(err);
      throw new Error(`the local ${s.name} service did not start: ${reason}`);
    }
  }
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
  console.error("[services]", err instanceof Error ? err.message : err);
  process.exit(1);
});
