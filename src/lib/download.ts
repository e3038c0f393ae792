/**
 * Offers a blob as a file download. The link is attached while clicked (some browsers ignore a
 * detached one) and the object URL outlives the click by a second so the download can start.
 */
export function downloadBlob(blob: Blob, filename: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = filename;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/** Offers `text` as a download of the given type (CSV unless told). */
export function downloadText(text: string, filename: string, type = 'text/csv'): void {
  downloadBlob(new Blob([text], { type: `${type};charset=utf-8` }), filename);
}
