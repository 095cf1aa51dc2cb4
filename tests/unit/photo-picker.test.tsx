// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { PhotoPicker } from '@/components/photos/PhotoPicker';
import { PHOTO_LIMITS, PHOTO_MESSAGES } from '@/lib/photos/limits';

const fetchMock = vi.fn();
beforeEach(() => {
  fetchMock.mockReset();
  vi.stubGlobal('fetch', fetchMock);
});
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** A file of `bytes` bytes (content irrelevant: the picker checks sizes before sending). */
const fileOf = (name: string, bytes: number) => new File([new Uint8Array(bytes)], name, { type: 'image/jpeg' });
const MB = 1024 * 1024;

function pick(files: File[]) {
  const input = screen.getByLabelText('Photos (optional)') as HTMLInputElement;
  Object.defineProperty(input, 'files', { value: files, configurable: true });
  fireEvent.change(input);
}

describe('the photo picker says the server’s limits', () => {
  it('states both limits, per photo and per upload, in its hint', () => {
    render(<PhotoPicker onChange={() => {}} />);
    // 8 MB a photo, 24 MB an upload: lib/photos/limits.ts (product choice, common practice, no source)
    expect(screen.getByText(/8 MB each/)).toBeTruthy();
    expect(screen.getByText(/24 MB in all/)).toBeTruthy();
  });

  it('refuses a photo over the limit with the words the server uses', async () => {
    render(<PhotoPicker onChange={() => {}} />);
    pick([fileOf('huge.jpg', PHOTO_LIMITS.maxFileBytes + 1)]);
    expect((await screen.findByRole('alert')).textContent).toBe(PHOTO_MESSAGES.fileTooLarge('huge.jpg'));
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('refuses, before uploading, photos that together pass the upload limit', async () => {
    render(<PhotoPicker onChange={() => {}} />);
    // four photos of 7 MB: each under 8 MB, together 28 MB over the 24 MB an upload may carry
    pick(Array.from({ length: 4 }, (_, i) => fileOf(`p${i}.jpg`, 7 * MB)));
    expect((await screen.findByRole('alert')).textContent).toBe(PHOTO_MESSAGES.uploadTooLarge());
    expect(fetchMock).not.toHaveBeenCalled();
  });
});
