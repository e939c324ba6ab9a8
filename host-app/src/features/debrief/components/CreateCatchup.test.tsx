import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { Theme } from '@radix-ui/themes';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { CreateCatchup } from './CreateCatchup';

function renderIt() {
  const client = new QueryClient({ defaultOptions: { mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <Theme>
        <CreateCatchup sessionId="s-1" />
      </Theme>
    </QueryClientProvider>,
  );
}

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

describe('CreateCatchup', () => {
  it('posts to the session and shows the code and the student link', async () => {
    const fetchMock = vi.fn().mockResolvedValue(json(201, { id: 'c-1', code: 'KX7P2M', cardCount: 9 }));
    vi.stubGlobal('fetch', fetchMock);
    renderIt();
    await userEvent.click(screen.getByRole('button', { name: 'Create catch-up' }));
    expect(await screen.findByText('KX7P2M')).toBeInTheDocument();
    expect(screen.getByRole('status')).toHaveTextContent('/play/catchup/KX7P2M');
    expect(screen.getByRole('status')).toHaveTextContent('9 items');
    expect(fetchMock.mock.calls[0][0]).toBe('/api/sessions/s-1/catchups');
    expect(fetchMock.mock.calls[0][1].method).toBe('POST');
  });

  it("shows the server's refusal", async () => {
    vi.stubGlobal('fetch', vi.fn().mockResolvedValue(json(409, { ok: false, error: 'nothing_missed', message: 'Nobody missed anything.' })));
    renderIt();
    await userEvent.click(screen.getByRole('button', { name: 'Create catch-up' }));
    expect(await screen.findByText('Nobody missed anything.')).toBeInTheDocument();
  });
});
