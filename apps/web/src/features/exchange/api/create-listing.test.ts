import '@/testing/setup';
import type { ListingInput } from '@app/shared';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { errorReply, mockApi } from '@/testing/mock-api';
import { createListing } from './create-listing';
import { uploadPhotos } from './upload-photos';

vi.mock('./upload-photos', () => ({ uploadPhotos: vi.fn() }));
const upload = vi.mocked(uploadPhotos);

const input = {
  category: 'other',
  title: 'Boat hook',
  description: 'Telescopic.',
  condition: 'good',
  priceCents: 1500,
  currency: 'EUR',
  harborId: 1,
  specs: {},
} as ListingInput;
const photo = () =>
  new File([new Uint8Array([0xff, 0xd8, 0xff])], 'hook.jpg', { type: 'image/jpeg' });
const listing = (status: string) => ({ data: { id: 9, status, title: 'Boat hook' } });

beforeEach(() => {
  upload.mockReset();
});

describe('creating a listing with its photos in one step', () => {
  it('saves the draft, uploads the photos to it, then publishes', async () => {
    const order: string[] = [];
    const { requests } = mockApi({
      'POST /api/listings': () => {
        order.push('create');
        return { status: 201, body: listing('draft') };
      },
      'POST /api/listings/9/publish': () => {
        order.push('publish');
        return { body: listing('active') };
      },
    });
    upload.mockImplementation((id, files) => {
      order.push(`upload ${id} ×${files.length}`);
      return Promise.resolve([]);
    });
    const out = await createListing({ input, photos: [photo(), photo()], publish: true });
    expect(order).toEqual(['create', 'upload 9 ×2', 'publish']);
    expect(requests[0]?.body).toMatchObject({ title: 'Boat hook' });
    expect(requests[0]?.body).not.toHaveProperty('publish');
    expect(out).toEqual({ listing: listing('active').data, problem: null });
  });

  it('keeps the draft and says so when the photos fail, and does not publish', async () => {
    const { requests } = mockApi({
      'POST /api/listings': () => ({ status: 201, body: listing('draft') }),
    });
    upload.mockRejectedValue(new Error('Upload failed'));
    const out = await createListing({ input, photos: [photo()], publish: true });
    expect(out.listing.id).toBe(9);
    expect(out.problem).toMatch(/draft is saved, but the photos were not/);
    expect(requests.map((r) => r.url)).toEqual([expect.stringMatching(/\/api\/listings$/)]);
  });

  it('keeps the draft with its photos when publishing is refused (dues not paid)', async () => {
    mockApi({
      'POST /api/listings': () => ({ status: 201, body: listing('draft') }),
      'POST /api/listings/9/publish': () =>
        errorReply(
          403,
          'FORBIDDEN',
          'The club asks for a paid-up membership before gear is listed.',
        ),
    });
    upload.mockResolvedValue([]);
    const out = await createListing({ input, photos: [photo()], publish: true });
    expect(out.problem).toMatch(/saved with its photos, but not published: .*paid-up/);
  });

  it('a draft without photos sends no upload', async () => {
    mockApi({ 'POST /api/listings': () => ({ status: 201, body: listing('draft') }) });
    const out = await createListing({ input, photos: [], publish: false });
    expect(upload).not.toHaveBeenCalled();
    expect(out.problem).toBeNull();
  });
});
