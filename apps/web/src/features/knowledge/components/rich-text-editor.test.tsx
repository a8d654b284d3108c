import '@/testing/setup';
import { fireEvent, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { errorReply, mockApi } from '@/testing/mock-api';
import { renderWithProviders } from '@/testing/render';
import { RichTextEditor } from './rich-text-editor';

const file = () => new File([new Uint8Array([137, 80, 78, 71])], 'deck.png', { type: 'image/png' });

describe('RichTextEditor image upload', () => {
  it('shows the server’s reason when the member’s image storage is full, and inserts nothing', async () => {
    const quota =
      'Your images take 199.9 MB of the 200.0 MB each member may keep, and this one needs 0.4 MB more. Remove photos from old listings or images from old posts to make room.';
    const { requests } = mockApi({
      'POST /api/uploads/images': () =>
        errorReply(409, 'CONFLICT', quota, { image: 'Image storage full (199.9 MB of 200.0 MB)' }),
    });
    const onChange = vi.fn();
    renderWithProviders(<RichTextEditor initial={null} onChange={onChange} labelId="body-label" />);
    fireEvent.change(screen.getByLabelText('Image file'), { target: { files: [file()] } });
    expect(await screen.findByRole('alert')).toHaveTextContent(/199\.9 MB of the 200\.0 MB/);
    expect(requests.filter((r) => r.url.endsWith('/uploads/images'))).toHaveLength(1);
    expect(document.querySelector('.ProseMirror img')).toBeNull();
  });

  it('inserts the uploaded image where the cursor is', async () => {
    mockApi({
      'POST /api/uploads/images': () => ({
        status: 201,
        body: { data: { url: '/uploads/images/2026/12/a.webp', width: 64, height: 48 } },
      }),
    });
    renderWithProviders(<RichTextEditor initial={null} onChange={vi.fn()} labelId="body-label" />);
    fireEvent.change(screen.getByLabelText('Image file'), { target: { files: [file()] } });
    await vi.waitFor(() =>
      expect(document.querySelector('.ProseMirror img')?.getAttribute('src')).toBe(
        '/uploads/images/2026/12/a.webp',
      ),
    );
    expect(screen.queryByRole('alert')).toBeNull();
  });
});
