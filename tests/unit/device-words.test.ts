// The few words the account page shows for a signed-in device, from its browser's User-Agent.
import { describe, expect, it } from "vitest";
import { deviceWords } from "@/components/auth/deviceWords";

describe("deviceWords", () => {
  it("names the browser and the system of the common families", () => {
    expect(deviceWords("Mozilla/5.0 (X11; Linux x86_64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/124.0.0.0 Safari/537.36")).toBe("Chrome on Linux");
    expect(deviceWords("Mozilla/5.0 (Windows NT 10.0; Win64; x64; rv:125.0) Gecko/20100101 Firefox/125.0")).toBe("Firefox on Windows");
    expect(deviceWords("Mozilla/5.0 (Windows NT 10.0; Win64; x64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/124.0.0.0 Safari/537.36 Edg/124.0.0.0")).toBe("Edge on Windows");
    expect(deviceWords("Mozilla/5.0 (Macintosh; Intel Mac OS X 14_4) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.4 Safari/605.1.15")).toBe("Safari on macOS");
    expect(deviceWords("Mozilla/5.0 (iPhone; CPU iPhone OS 17_4 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/17.4 Mobile/15E148 Safari/604.1")).toBe("Safari on iOS");
    expect(deviceWords("Mozilla/5.0 (Linux; Android 14; Pixel 8) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/124.0.0.0 Mobile Safari/537.36")).toBe("Chrome on Android");
  });

  it("a tool says it is a program and its name; nothing at all is an unknown device", () => {
    expect(deviceWords("Mozilla/5.0 (X11; Linux x86_64) AppleWebKit/537.36 (KHTML, like Gecko) HeadlessChrome/124.0.0.0 Safari/537.36")).toBe("Chrome on Linux");
    expect(deviceWords("curl/8.5.0")).toBe("A program (curl/8.5.0)");
    expect(deviceWords("")).toBe("Unknown device");
    expect(deviceWords(null)).toBe("Unknown device");
  });
});
