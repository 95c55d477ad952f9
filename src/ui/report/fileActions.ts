/** Saving and sharing files from the page, behind one small interface so tests can pass fakes. */
export interface FileActions {
  /** Offers a file for download (the browser's save). */
  download(name: string, type: string, text: string): void;
  /** Web Share when the browser has it; false when it does not (or the chemist cancelled). */
  share(data: { title: string; text: string; file?: { name: string; type: string; text: string } }): Promise<boolean>;
  canShare: boolean;
  /** Puts text on the clipboard; false when the page may not. */
  copyText(text: string): Promise<boolean>;
  print(): void;
}

export function browserFileActions(): FileActions {
  const nav = globalThis.navigator as Navigator | undefined;
  return {
    download(name, type, text) {
      const url = URL.createObjectURL(new Blob([text], { type }));
      const link = document.createElement('a');
      link.href = url;
      link.download = name;
      document.body.append(link);
      link.click();
      link.remove();
      // Revoked later: some browsers read the URL after click() returns.
      setTimeout(() => URL.revokeObjectURL(url), 10_000);
    },
    async share({ title, text, file }) {
      if (!nav?.share) return false;
      const files = file ? [new File([file.text], file.name, { type: file.type })] : [];
      const withFiles = files.length > 0 && nav.canShare?.({ files }) === true;
      try {
        await nav.share(withFiles ? { title, text, files } : { title, text });
        return true;
      } catch {
        return false;
      }
    },
    canShare: typeof nav?.share === 'function',
    async copyText(text) {
      try {
        await nav?.clipboard.writeText(text);
        return nav?.clipboard !== undefined;
      } catch {
        return false;
      }
    },
    print: () => window.print(),
  };
}

/** A file name from a run's title and date: letters, digits and dashes only. */
export function runFileName(title: string, startedAt: string, extension: string): string {
  const stem = `${startedAt.slice(0, 10)}-${title}`.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60);
  return `${stem || 'run'}.${extension}`;
}
