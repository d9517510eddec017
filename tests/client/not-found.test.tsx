import { describe, expect, it } from 'vitest';
import { screen } from '@testing-library/react';
import { renderWithProviders } from '../helpers/render';
import { NotFoundPage } from '../../src/routes/not-found';

describe('NotFoundPage', () => {
  it('says the page does not exist and links home', () => {
    renderWithProviders(<NotFoundPage />);
    expect(screen.getByRole('heading', { level: 1 })).toHaveTextContent(/nothing moved/i);
    expect(screen.getByRole('link', { name: 'Home' })).toHaveAttribute('href', '/');
  });
});
