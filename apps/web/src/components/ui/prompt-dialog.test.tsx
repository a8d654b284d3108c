import '@/testing/setup';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { usePromptDialog, type PromptOptions } from './prompt-dialog';

/** A button that asks and prints what came back, as the screens use the hook. */
function Asker({ options }: { options: PromptOptions }) {
  const { ask, dialog } = usePromptDialog();
  const [answer, setAnswer] = useState('(none yet)');
  return (
    <>
      <button
        type="button"
        onClick={() => {
          void ask(options).then((a) => setAnswer(a === null ? 'cancelled' : `got: ${a}`));
        }}
      >
        Ask
      </button>
      <p data-testid="answer">{answer}</p>
      {dialog}
    </>
  );
}

const reason: PromptOptions = {
  title: 'Decline this post',
  label: 'Reason',
  confirmLabel: 'Decline',
};

describe('usePromptDialog', () => {
  it('resolves with the trimmed answer and closes', async () => {
    const user = userEvent.setup();
    render(<Asker options={reason} />);
    await user.click(screen.getByRole('button', { name: 'Ask' }));
    const field = screen.getByLabelText('Reason');
    expect(field).toHaveFocus();
    await user.type(field, '  Names a real boat.  ');
    await user.click(screen.getByRole('button', { name: 'Decline' }));
    expect(screen.getByTestId('answer')).toHaveTextContent('got: Names a real boat.');
    expect(screen.queryByLabelText('Reason')).not.toBeInTheDocument();
  });

  it('refuses a too-short answer with a message tied to the field, and keeps the text', async () => {
    const user = userEvent.setup();
    render(<Asker options={reason} />);
    await user.click(screen.getByRole('button', { name: 'Ask' }));
    await user.type(screen.getByLabelText('Reason'), 'no');
    await user.click(screen.getByRole('button', { name: 'Decline' }));
    const field = screen.getByLabelText('Reason');
    expect(field).toHaveAttribute('aria-invalid', 'true');
    expect(field).toHaveAccessibleDescription('Reason needs at least 3 characters.');
    expect(field).toHaveValue('no');
    expect(screen.getByTestId('answer')).toHaveTextContent('(none yet)');
  });

  it('resolves null on Cancel', async () => {
    const user = userEvent.setup();
    render(<Asker options={reason} />);
    await user.click(screen.getByRole('button', { name: 'Ask' }));
    await user.type(screen.getByLabelText('Reason'), 'something');
    await user.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(screen.getByTestId('answer')).toHaveTextContent('cancelled');
  });

  it('starts from the initial text and runs the extra check', async () => {
    const user = userEvent.setup();
    render(
      <Asker
        options={{
          title: 'Link',
          label: 'Address',
          singleLine: true,
          initial: 'https://',
          minLength: 0,
          validate: (v) =>
            v === '' || /^https?:\/\/\S+\.\S+/.test(v) ? null : 'Use an http(s) address.',
        }}
      />,
    );
    await user.click(screen.getByRole('button', { name: 'Ask' }));
    const field = screen.getByLabelText('Address');
    expect(field).toHaveValue('https://');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    expect(field).toHaveAccessibleDescription('Use an http(s) address.');
    await user.clear(field);
    await user.type(field, 'https://example.org/snubber');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    expect(screen.getByTestId('answer')).toHaveTextContent('got: https://example.org/snubber');
  });
});
