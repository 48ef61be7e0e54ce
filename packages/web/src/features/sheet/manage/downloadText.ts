/** Save text as a file through the browser's download (no server round trip). */
export function downloadText(text: string, fileName: string, type = 'application/json'): void {
  const url = URL.createObjectURL(new Blob([text], { type }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.append(link);
  link.click();
  link.remove();
  // Some browsers start the download only after the click handler returns.
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
