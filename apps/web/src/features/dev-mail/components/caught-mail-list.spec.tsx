import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { errorBody, stubFetch } from '../../../testing/fetch-stub';
import { renderWithProviders } from '../../../testing/render';
import { CaughtMailList } from './caught-mail-list';

describe('CaughtMailList', () => {
  it('lists caught mail with its recipients, text and links', async () => {
    stubFetch({
      'GET /api/dev/mail': {
        status: 200,
        body: [
          {
            to: ['sam@example.test'],
            subject: 'Join Orchard Row on Jarday',
            text: 'Join the kitchen: http://127.0.0.1:3000/join/K7QM3RTX',
            links: ['http://127.0.0.1:3000/join/K7QM3RTX'],
            at: '2025-08-03T10:00:00.000Z',
          },
        ],
      },
    });
    renderWithProviders(<CaughtMailList />);
    expect(await screen.findByRole('heading', { name: 'Join Orchard Row on Jarday' })).toBeTruthy();
    expect(screen.getByText(/To sam@example.test/)).toBeTruthy();
    const link = screen.getByRole('link', { name: 'http://127.0.0.1:3000/join/K7QM3RTX' });
    expect(link.getAttribute('href')).toBe('http://127.0.0.1:3000/join/K7QM3RTX');
  });

  it('says so when the server runs no catcher', async () => {
    stubFetch({ 'GET /api/dev/mail': { status: 404, body: errorBody(404, 'not_found', 'Cannot GET /api/dev/mail') } });
    renderWithProviders(<CaughtMailList />);
    expect(await screen.findByText(/This server runs no mail catcher/)).toBeTruthy();
  });
});
