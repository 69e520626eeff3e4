import { screen, waitFor } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { renderWithProviders } from '../../../testing/render';
import { KITCHEN_ID, lot, LOT_ID } from '../testing/pantry-fixtures';
import { LabelsDownload } from './labels-download';

const PDF = `GET /api/kitchens/${KITCHEN_ID}/lots/${LOT_ID}/labels.pdf`;

describe('the labels download', () => {
  it('asks for the chosen sheet and hands the file to the browser', async () => {
    const stub = stubFetch({ [PDF]: { status: 200, body: '%PDF-1.7' } });
    const created = vi.spyOn(URL, 'createObjectURL').mockReturnValue('blob:labels');
    vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
    const clicked = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => undefined);
    const { user } = renderWithProviders(<LabelsDownload kitchenId={KITCHEN_ID} lot={lot()} />);
    await user.click(screen.getByRole('combobox', { name: 'Label sheet' }));
    await user.click(screen.getByRole('option', { name: 'US Letter paper, 2 in rounds (lids)' }));
    await user.click(screen.getByRole('button', { name: 'Download labels (PDF)' }));
    await waitFor(() => expect(clicked).toHaveBeenCalledTimes(1));
    expect(stub.to(PDF)).toHaveLength(1);
    expect(stub.fetchMock.mock.calls[0]?.[0]).toBe(
      `/api/kitchens/${KITCHEN_ID}/lots/${LOT_ID}/labels.pdf?sheet=letter-round-2in`,
    );
    expect(await (created.mock.calls[0]?.[0] as Blob).text()).toBe('"%PDF-1.7"');
    const link = clicked.mock.contexts[0] as HTMLAnchorElement;
    expect(link.download).toBe('jarday-labels-250906-A-letter-round-2in.pdf');
  });

  it('shows the server’s message when there is nothing to print', async () => {
    const message = 'Lot 250906-A has no sealed jars to label';
    stubFetch({ [PDF]: { status: 409, body: errorBody(409, 'conflict', message) } });
    const { user } = renderWithProviders(<LabelsDownload kitchenId={KITCHEN_ID} lot={lot()} />);
    await user.click(screen.getByRole('button', { name: 'Download labels (PDF)' }));
    expect((await screen.findByRole('alert')).textContent).toBe(message);
  });
});
