import { act, screen } from '@testing-library/react';
import { Route, Routes } from 'react-router-dom';
import { afterEach, describe, expect, it } from 'vitest';
import { sessionStore } from '@/lib/session';
import { renderWithProviders } from '@/testing/render';
import { RequireRole } from './require-role';

afterEach(() => sessionStore.clear());

const tree = (
  <Routes>
    <Route path="/sign-in" element={<p>sign-in page</p>} />
    <Route
      path="/admin"
      element={
        <RequireRole roles={['admin']}>
          <p>admin page</p>
        </RequireRole>
      }
    />
  </Routes>
);

describe('RequireRole', () => {
  it('sends a signed-out visitor to sign in', () => {
    renderWithProviders(tree, { route: '/admin' });
    expect(screen.getByText('sign-in page')).toBeInTheDocument();
  });

  it('waits, instead of sending to sign in, while the session is being restored from the refresh cookie', () => {
    sessionStore.restoring();
    renderWithProviders(tree, { route: '/admin' });
    expect(screen.getByText('Signing you in again…')).toBeInTheDocument();
    expect(screen.queryByText('sign-in page')).not.toBeInTheDocument();
    act(() =>
      sessionStore.set({
        token: 't',
        user: { id: 1, email: 'sam@tidewater-crossing.example.test', name: 'Sam Oduya', role: 'admin' },
      }),
    );
    expect(screen.getByText('admin page')).toBeInTheDocument();
  });

  it('tells a signed-in user when the page is not for their role', () => {
    sessionStore.set({
      token: 't',
      user: { id: 3, email: 'tomasz@larchmont-review.example.test', name: 'Tomasz Quell', role: 'checker' },
    });
    renderWithProviders(tree, { route: '/admin' });
    expect(screen.getByText('This page is not part of your role')).toBeInTheDocument();
    expect(screen.queryByText('admin page')).not.toBeInTheDocument();
  });

  it('lets the right role in', () => {
    sessionStore.set({
      token: 't',
      user: { id: 1, email: 'sam@tidewater-crossing.example.test', name: 'Sam Oduya', role: 'admin' },
    });
    renderWithProviders(tree, { route: '/admin' });
    expect(screen.getByText('admin page')).toBeInTheDocument();
  });
});
