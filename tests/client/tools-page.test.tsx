import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import ToolsPage from '../../src/routes/tools';
import { renderWithProviders } from '../helpers/render';

describe('the column planner opened from a plate read', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('when the address carries the target and nearest-spot Rf, then the planner starts from them', () => {
    // The plan itself is asked of the server; these tests only look at the inputs, so the request never answers.
    vi.stubGlobal('fetch', () => new Promise<Response>(() => {}));
    renderWithProviders(<ToolsPage />, { route: '/tools?rfTarget=0.27&rfImpurity=0.41' });
    expect(screen.getByLabelText(/Target Rf/)).toHaveValue('0.27');
    expect(screen.getByLabelText(/Nearest other spot Rf/)).toHaveValue('0.41');
  });

  it('when the address carries an Rf outside (0, 1], then the planner keeps its own start', () => {
    vi.stubGlobal('fetch', () => new Promise<Response>(() => {}));
    renderWithProviders(<ToolsPage />, { route: '/tools?rfTarget=7&rfImpurity=abc' });
    expect(screen.getByLabelText(/Target Rf/)).toHaveValue('0.30');
    expect(screen.getByLabelText(/Nearest other spot Rf/)).toHaveValue('');
  });
});
