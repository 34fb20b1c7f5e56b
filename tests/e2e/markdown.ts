/** Markdown escapes (`g\_J`) removed, so hover text can be compared with what the user reads. */
export function unescapeMarkdown(text: string): string {
  return text.replace(/\\([\\`*_{}[\]()#+\-.!|<>~])/g, '$1');
}
