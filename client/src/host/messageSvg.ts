/** A small SVG that says why there is no diagram, so the panel never shows a blank page. */
export function messageSvg(text: string): string {
  const esc = text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 640 60" role="img"><title>${esc}</title><text x="12" y="34" font-size="14" fill="currentColor">${esc}</text></svg>`;
}
