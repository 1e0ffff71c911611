/** Saves bytes as a file through the browser's download (a blob: URL, no network). */
export function download(content: Uint8Array | string | Blob, name: string, mime: string): void {
  const part = content instanceof Uint8Array ? new Uint8Array(content) : content; // a copy owns a plain ArrayBuffer
  const url = URL.createObjectURL(content instanceof Blob ? content : new Blob([part], { type: mime }));
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
