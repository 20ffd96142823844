/** Hands a file to the browser's download (an <a download> click). */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  a.rel = 'noopener';
  a.style.display = 'none';
  document.body.appendChild(a);
  a.click();
  a.remove();
  // Revoked after the click has started the download.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
