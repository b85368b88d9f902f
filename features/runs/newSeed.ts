/** Fills bytes from the platform's cryptographic generator, or Math.random where there is none (Hermes without a polyfill). */
function fillRandom(bytes: Uint8Array<ArrayBuffer>): void {
  if (typeof globalThis.crypto?.getRandomValues === 'function') globalThis.crypto.getRandomValues(bytes);
  else for (let i = 0; i < bytes.length; i++) bytes[i] = Math.floor(Math.random() * 256);
}

/** A fresh random seed: 16 hex digits. */
export function newSeed(): string {
  const bytes = new Uint8Array(8);
  fillRandom(bytes);
  return Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('');
}
