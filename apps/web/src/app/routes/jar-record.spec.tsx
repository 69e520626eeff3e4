import type { JarRecordView } from '@jarday/contracts';
import { screen } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { useSessionStore } from '../../features/auth/stores/session-store';
import { errorBody, stubFetch } from '../../testing/fetch-stub';
import { renderWithProviders } from '../../testing/render';
import JarRecordRoute from './jar-record';

const REF = 'AbCdEfGhIjKlMnOpQrStUvWx-2-3';
const record = (over: Partial<JarRecordView> = {}): JarRecordView => ({
  code: '260815-B',
  jarNumber: 3,
  product: 'Apricot jam',
  dayDate: '2026-08-15',
  loadNumber: 2,
  jarSize: 'half-pint',
  method: 'boiling-water',
  processMinutes: 10,
  altitude: { value: 2100, unit: 'ft' },
  bestBy: '2027-08-15',
  seal: 'sealed',
  flagged: false,
  member: null,
  ...over,
});

const show = (status: 'signed-in' | 'signed-out' = 'signed-out') => {
  useSessionStore.setState({ status });
  return renderWithProviders(
    <Routes>
      <Route path="/r/:ref" element={<JarRecordRoute />} />
    </Routes>,
    { route: `/r/${REF}` },
  );
};

describe('the jar record page', () => {
  it('shows a recipient the jar, its process and the caution with its source, and no kitchen link', async () => {
    const stub = stubFetch({ [`GET /api/records/${REF}`]: { status: 200, body: record() } });
    show();
    expect(await screen.findByRole('heading', { level: 1, name: 'Apricot jam' })).toBeTruthy();
    expect(screen.getByText('Lot 260815-B · load 2, jar 3')).toBeTruthy();
    expect(screen.getByText('10 min at 2,100 ft')).toBeTruthy();
    expect(screen.getByText('Sealed when checked')).toBeTruthy();
    expect(screen.getByText(/do not taste it to find out/)).toBeTruthy();
    expect(screen.getByText(/Source: USDA Complete Guide to Home Canning/)).toBeTruthy();
    expect(screen.queryByRole('link', { name: /Open lot/ })).toBeNull();
    expect(screen.queryByText(/Spoilage reported/)).toBeNull();
    expect(stub.to(`GET /api/records/${REF}`)).toHaveLength(1);
  });

  it('puts the spoilage caution first for a flagged lot, and the unsealed-jar one for a jar that did not seal', async () => {
    stubFetch({ [`GET /api/records/${REF}`]: { status: 200, body: record({ flagged: true, seal: 'unsealed' }) } });
    show();
    expect(await screen.findByText('Spoilage reported: do not taste')).toBeTruthy();
    expect(screen.getByText('A jar that did not seal')).toBeTruthy();
    expect(screen.getByText('Did not seal when checked')).toBeTruthy();
  });

  it('links a member to the lot in their kitchen', async () => {
    const member = { kitchenId: 'k1', kitchenName: 'Quarry Hill Kitchen', lotId: 'l1', dayId: 'd1', loadId: 'x1' };
    stubFetch({ [`GET /api/records/${REF}`]: { status: 200, body: record({ member }) } });
    show('signed-in');
    const link = await screen.findByRole('link', { name: 'Open lot 260815-B in Quarry Hill Kitchen' });
    expect(link.getAttribute('href')).toBe('/kitchens/k1/pantry/l1');
  });

  it('says plainly when no jar has the label', async () => {
    stubFetch({
      [`GET /api/records/${REF}`]: { status: 404, body: errorBody(404, 'not_found', 'Jar record not found') },
    });
    show();
    expect(await screen.findByText(/No jar has this label/)).toBeTruthy();
  });
});
