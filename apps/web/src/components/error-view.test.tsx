import { render, screen } from '@testing-library/react';
import { MemoryRouter } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { ApiError, ConnectionError } from '../api/client';
import { ErrorView } from './error-view';

const renderError = (error: unknown) =>
  render(
    <MemoryRouter>
      <ErrorView error={error} />
    </MemoryRouter>,
  );

describe('ErrorView', () => {
  it('has a page for a lost connection, with a way to try again', () => {
    renderError(new ConnectionError('offline'));
    expect(screen.getByRole('heading', { name: 'Connection lost' })).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });

  it('treats a 404 from the API as "no such page" (what a user may not see is not found)', () => {
    renderError(new ApiError(404, 'not_found', 'not found'));
    expect(screen.getByRole('heading', { name: 'No such page' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to Projects' })).toHaveAttribute('href', '/');
  });

  it('says what else went wrong rather than showing a blank page', () => {
    renderError(new ApiError(409, 'stale_version', 'The project was changed by someone else.'));
    expect(screen.getByText('The project was changed by someone else.')).toBeInTheDocument();
  });
});
