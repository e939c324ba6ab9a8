import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { App } from './App';

describe(App.name, () => {
  it('loads the join page', async () => {
    render(<App />);
    expect(await screen.findByRole('heading', { name: 'Join the review' })).toBeInTheDocument();
    expect(screen.getByLabelText('Join code')).toBeInTheDocument();
  });
});
