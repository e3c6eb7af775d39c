// The local SMTP fake keeps serving when a client drops its connection with a reset (a test
// process that ends mid-session does this); before, the unheard error ended the process that
// also runs the local object storage.
import { createServer, connect, type Socket } from "node:net";
import { describe, expect, it, vi } from "vitest";
import { startMailFake } from "@/lib/mail-fake";

async function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = createServer();
    s.listen(0, "127.0.0.1", () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

function greeting(port: number): Promise<{ socket: Socket; banner: string }> {
  return new Promise((resolve, reject) => {
    const socket = connect(port, "127.0.0.1");
    socket.once("error", reject);
    socket.once("data", (d) => resolve({ socket, banner: d.toString() }));
  });
}

/** Send a command and wait for a reply line matching `expected`. */
function say(socket: Socket, line: string, expected: RegExp): Promise<void> {
  return new Promise((resolve) => {
    let got = "";
    const onData = (d: Buffer) => {
      got += d.toString();
      if (expected.test(got)) {
        socket.off("data", onData);
        resolve();
      }
    };
    socket.on("data", onData);
    socket.write(line);
  });
}

describe("local SMTP fake", () => {
  it("answers the next client after one resets its connection", async () => {
    const port = await freePort();
    const logged = vi.spyOn(console, "error").mockImplementation(() => undefined);
    const stop = await startMailFake({ port, onMail: async () => undefined });
    try {
      const first = await greeting(port);
      expect(first.banner).toMatch(/^220 /);
      // in the middle of a transaction (after MAIL FROM): the case the server reports as an error
      await say(first.socket, "EHLO test\r\n", /^250 /m);
      await say(first.socket, "MAIL FROM:<checker@example.test>\r\n", /^250 /m);
      first.socket.resetAndDestroy();
      await new Promise((r) => setTimeout(r, 200));
      const second = await greeting(port);
      expect(second.banner).toMatch(/^220 /);
      second.socket.destroy();
    } finally {
      await stop();
      logged.mockRestore();
    }
  });
});
