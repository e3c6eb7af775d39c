// A reply whose body breaks off after its first chunk (the connection lost mid-download), as
// fetch hands it over: the status and headers came, reading the body then fails.
export function brokenOffReply(firstChunk: string, headers: Record<string, string>): Response {
  let sent = false;
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (sent) return controller.error(new TypeError("network error"));
      sent = true;
      controller.enqueue(new TextEncoder().encode(firstChunk));
    },
  });
  return new Response(body, { status: 200, headers });
}
