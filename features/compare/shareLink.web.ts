/** Copies the app address of `path` to the clipboard; resolves false when the browser refuses. */
export async function shareLink(path: string): Promise<boolean> {
  try {
    await navigator.clipboard.writeText(`${window.location.origin}${path}`);
    return true;
  } catch {
    return false;
  }
}
