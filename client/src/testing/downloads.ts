import { vi } from 'vitest';

/** What a page handed the browser to save, in order: each file's name and its content. */
export interface CaughtDownloads {
  names: string[];
  blobs: Blob[];
}

/**
 * Catches the files a page saves (`saveFile`: an object URL on a link that is clicked), since jsdom has neither
 * object URLs nor downloads. The spies are undone after each test (`restoreMocks` in vitest.config.ts).
 */
export function catchDownloads(): CaughtDownloads {
  const caught: CaughtDownloads = { names: [], blobs: [] };
  const createObjectURL = (blob: Blob) => {
    caught.blobs.push(blob);
    return `blob:download-${caught.blobs.length}`;
  };
  Object.defineProperty(URL, 'createObjectURL', { configurable: true, value: vi.fn(createObjectURL) });
  Object.defineProperty(URL, 'revokeObjectURL', { configurable: true, value: vi.fn() });
  vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
    caught.names.push(this.download);
  });
  return caught;
}
