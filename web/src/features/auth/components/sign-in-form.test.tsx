import { fireEvent, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { ApiError } from '@/lib/api-error';
import { renderWithProviders } from '@/testing/render';
import { SignInForm } from './sign-in-form';

describe('SignInForm', () => {
  it('says what is missing under each field and does not submit', () => {
    const onSubmit = vi.fn();
    renderWithProviders(<SignInForm onSubmit={onSubmit} pending={false} error={null} />);
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(screen.getByText('Enter the e-mail address you were invited with.')).toBeInTheDocument();
    expect(screen.getByText('Enter your password.')).toBeInTheDocument();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('submits the trimmed e-mail and the password', () => {
    const onSubmit = vi.fn();
    renderWithProviders(<SignInForm onSubmit={onSubmit} pending={false} error={null} />);
    fireEvent.change(screen.getByLabelText(/E-mail/), {
      target: { value: ' tomasz@larchmont-review.example.test ' },
    });
    fireEvent.change(screen.getByLabelText(/Password/), { target: { value: 'lantern-demo-2026' } });
    fireEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(onSubmit).toHaveBeenCalledWith({
      email: 'tomasz@larchmont-review.example.test',
      password: 'lantern-demo-2026',
    });
  });

  it("shows the API's own message when the sign-in is refused, without the HTTP status", () => {
    const error = new ApiError({
      statusCode: 401,
      error: 'Unauthorized',
      message: 'E-mail or password is wrong.',
    });
    renderWithProviders(<SignInForm onSubmit={vi.fn()} pending={false} error={error} />);
    expect(screen.getByRole('alert')).toHaveTextContent('E-mail or password is wrong.');
    expect(screen.getByRole('alert')).not.toHaveTextContent(/401|Unauthorized/);
  });
});
