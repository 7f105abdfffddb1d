/** Offer text as a file download (CSV templates, exports). */
export function downloadText(fileName: string, text: string, contentType = 'text/csv;charset=utf-8'): void {
  const url = URL.createObjectURL(new Blob([text], { type: contentType }));
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.click();
  // The click has started the download; the object URL can go on the next turn.
  setTimeout(() => URL.revokeObjectURL(url), 0);
}
