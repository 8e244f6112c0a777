/** Hands a Blob to the browser as a file download (the link is created, clicked and dropped). */
export function saveBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  link.style.display = 'none';
  document.body.appendChild(link);
  link.click();
  link.remove();
  // Let the click start the download before the URL is released.
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
