import type { AttachmentView } from '@jarday/contracts';
import { screen, waitFor, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { bindAuth } from '../../../lib/api-client';
import { useSessionStore } from '../../auth/stores/session-store';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { renderWithProviders } from '../../../testing/render';
import { AttachmentsPanel } from './attachments-panel';

const K = 'k1';
const DAY = '6f1c3a52-9a43-4c1e-8a37-2f0d7c3b1a10';
const base = `/api/kitchens/${K}/attachments`;
const me = { id: 'u-helper', email: 'helper@kitchen.test', name: 'Hana', createdAt: '2026-08-01T00:00:00.000Z' };

const attachment = (over: Partial<AttachmentView>): AttachmentView => ({
  id: 'a1',
  subject: 'day',
  subjectId: DAY,
  fileName: 'jars.jpg',
  mime: 'image/jpeg',
  bytes: 2048,
  width: 640,
  height: 480,
  hasThumb: true,
  uploadedById: me.id,
  uploadedByName: 'Hana',
  createdAt: '2026-08-15T18:00:00.000Z',
  ...over,
});
const photo = attachment({});
const card = attachment({
  id: 'a2',
  fileName: 'card.pdf',
  mime: 'application/pdf',
  hasThumb: false,
  width: null,
  height: null,
  uploadedById: 'u-lead',
  uploadedByName: 'Lee',
});

const fileInput = () => document.querySelector<HTMLInputElement>('input[type="file"]')!;

describe('AttachmentsPanel', () => {
  let unbind: () => void;
  beforeEach(() => {
    unbind = bindAuth({ getAccessToken: () => 'token-1', renewAccessToken: () => Promise.resolve(null) });
    useSessionStore.getState().setSession({
      user: me,
      accessToken: 'token-1',
      accessTokenExpiresAt: '2099-01-01T00:00:00.000Z',
    });
    vi.spyOn(URL, 'createObjectURL').mockImplementation(() => 'blob:thumb-a1');
    vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
  });
  afterEach(() => unbind());

  it('shows photos by their thumbnails, fetched with the bearer header, and documents by name', async () => {
    const stub = stubFetch({
      [`GET ${base}`]: { status: 200, body: [photo, card] },
      [`GET ${base}/a1/thumb`]: { status: 200, body: 'webp bytes' },
    });
    renderWithProviders(<AttachmentsPanel kitchenId={K} role="helper" subject="day" subjectId={DAY} />);

    const img = await screen.findByRole('img', { name: 'jars.jpg' });
    expect(img.getAttribute('src')).toBe('blob:thumb-a1');
    expect(stub.to(`GET ${base}/a1/thumb`)[0]?.headers.Authorization).toBe('Bearer token-1');
    expect(screen.getByRole('button', { name: 'Open document card.pdf' })).toBeTruthy();
    // No thumbnail is asked for a PDF.
    expect(stub.to(`GET ${base}/a2/thumb`)).toHaveLength(0);
    // A helper removes their own photo, not the lead's document.
    expect(screen.getByRole('button', { name: 'Remove jars.jpg' })).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Remove card.pdf' })).toBeNull();
    expect(stub.to(`GET ${base}`)[0]).toBeTruthy();
  });

  it('uploads the chosen file as multipart and lists it', async () => {
    let listed: AttachmentView[] = [];
    const stub = stubFetch({
      [`GET ${base}`]: () => ({ status: 200, body: listed }),
      [`POST ${base}`]: () => {
        listed = [card];
        return { status: 201, body: card };
      },
    });
    const { user } = renderWithProviders(
      <AttachmentsPanel kitchenId={K} role="helper" subject="day" subjectId={DAY} />,
    );
    await screen.findByText(/No photos or documents yet/);
    expect(fileInput().accept).toBe('image/jpeg,image/png,image/webp,application/pdf');

    await user.upload(fileInput(), new File(['%PDF-1.4'], 'card.pdf', { type: 'application/pdf' }));

    await screen.findByRole('button', { name: 'Open document card.pdf' });
    const post = stub.fetchMock.mock.calls.find(([, init]) => init?.method === 'POST');
    const form = post?.[1]?.body as FormData;
    expect(new Headers(post?.[1]?.headers).get('Authorization')).toBe('Bearer token-1');
    expect(form.get('subject')).toBe('day');
    expect(form.get('subjectId')).toBe(DAY);
    expect((form.get('file') as File).name).toBe('card.pdf');
  });

  it('says plainly why a file was refused, and adds nothing', async () => {
    stubFetch({
      [`GET ${base}`]: { status: 200, body: [] },
      [`POST ${base}`]: {
        status: 415,
        body: errorBody(415, 'unsupported_file_type', 'This file is really EXE, whatever its name says'),
      },
    });
    const { user } = renderWithProviders(<AttachmentsPanel kitchenId={K} role="lead" subject="day" subjectId={DAY} />);
    await screen.findByText(/No photos or documents yet/);
    await user.upload(fileInput(), new File(['MZ'], 'photo.jpg', { type: 'image/jpeg' }));

    const alert = await screen.findByRole('alert');
    expect(within(alert).getByText(/Not added/)).toBeTruthy();
    expect(alert.textContent).toContain('This file is really EXE, whatever its name says');
    expect(screen.getByText(/No photos or documents yet/)).toBeTruthy();
  });

  it('lets a watcher look but offers no adding or removing', async () => {
    stubFetch({
      [`GET ${base}`]: { status: 200, body: [photo] },
      [`GET ${base}/a1/thumb`]: { status: 200, body: 'webp' },
    });
    renderWithProviders(<AttachmentsPanel kitchenId={K} role="watcher" subject="day" subjectId={DAY} />);
    await screen.findByRole('img', { name: 'jars.jpg' });
    expect(screen.queryByText('Add photo')).toBeNull();
    expect(fileInput()).toBeNull();
    expect(screen.queryByRole('button', { name: /Remove/ })).toBeNull();
  });

  it('removes a photo after asking', async () => {
    let listed = [photo];
    const stub = stubFetch({
      [`GET ${base}`]: () => ({ status: 200, body: listed }),
      [`GET ${base}/a1/thumb`]: { status: 200, body: 'webp' },
      [`DELETE ${base}/a1`]: () => {
        listed = [];
        return { status: 204 };
      },
    });
    const { user } = renderWithProviders(
      <AttachmentsPanel kitchenId={K} role="helper" subject="day" subjectId={DAY} />,
    );
    await user.click(await screen.findByRole('button', { name: 'Remove jars.jpg' }));
    await user.click(within(screen.getByRole('dialog')).getByRole('button', { name: 'Remove' }));
    await screen.findByText(/No photos or documents yet/);
    expect(stub.to(`DELETE ${base}/a1`)).toHaveLength(1);
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
  });
});
