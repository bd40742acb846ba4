import { fireEvent, render, screen, waitFor } from '@testing-library/react-native';
import { SignInForm } from '@/components/auth/sign-in-form';

describe('<SignInForm />', () => {
  it('shows the schema messages for empty fields and sends nothing', async () => {
    const onSubmit = jest.fn();
    render(<SignInForm onSubmit={onSubmit} />);
    fireEvent.press(screen.getByTestId('sign-in-submit'));
    expect(await screen.findByText('Enter an e-mail address.')).toBeOnTheScreen();
    expect(screen.getByText('Enter your password.')).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('questions a malformed e-mail', async () => {
    const onSubmit = jest.fn();
    render(<SignInForm onSubmit={onSubmit} />);
    fireEvent.changeText(screen.getByTestId('email'), 'not-an-email');
    fireEvent.changeText(screen.getByTestId('password'), 'x');
    fireEvent.press(screen.getByTestId('sign-in-submit'));
    expect(await screen.findByText(/valid e-mail/)).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
  });

  it('submits trimmed valid values', async () => {
    const onSubmit = jest.fn();
    render(<SignInForm onSubmit={onSubmit} />);
    fireEvent.changeText(screen.getByTestId('email'), ' tech@bootwright.test ');
    fireEvent.changeText(screen.getByTestId('password'), 'secret-password');
    fireEvent.press(screen.getByTestId('sign-in-submit'));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledWith({ email: 'tech@bootwright.test', password: 'secret-password' }));
  });

  it('shows a server error it is given', () => {
    render(<SignInForm onSubmit={jest.fn()} error="That e-mail and password do not match an account." />);
    expect(screen.getByTestId('sign-in-error')).toHaveTextContent(/do not match/);
  });
});
