// jsdom has <dialog> but not its modal methods: opening and closing set the attribute.
export function withModalDialogs(): void {
  HTMLDialogElement.prototype.showModal = function (this: HTMLDialogElement) {
    this.setAttribute("open", "");
  };
  HTMLDialogElement.prototype.close = function (this: HTMLDialogElement) {
    this.removeAttribute("open");
  };
}

/** jsdom has no ResizeObserver: one that never reports (the layouts keep their first size). */
export function withResizeObserver(): void {
  if (typeof globalThis.ResizeObserver !== "undefined") return;
  globalThis.ResizeObserver = class {
    observe() {}
    unobserve() {}
    disconnect() {}
  } as unknown as typeof ResizeObserver;
}
