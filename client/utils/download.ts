/** A file name from a plan's name: "Loft layout, v2" → "loft-layout-v2". */
export function fileSlug(name: string): string {
  const slug = name
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  return slug || 'plan';
}

/** Hand a file to the browser to save, as a download link it clicks itself; the object URL is freed afterwards. */
export function downloadBlob(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  link.style.display = 'none';
  document.body.append(link);
  link.click();
  link.remove();
  // Some browsers read the URL after the click returns: free it a little later.
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}
