// States are marked by a symbol and a word as well as colour; the radio group reports the checked option.
import { fireEvent, render, screen } from '@testing-library/react-native';
import { Banner } from '@/components/ui/banner';
import { Choice } from '@/components/ui/choice';

describe('<Banner />', () => {
  it.each([
    ['error', '✕', 'Error'],
    ['warning', '!', 'Warning'],
    ['note', 'i', 'Note'],
    ['success', '✓', 'Done'],
  ] as const)('%s shows its symbol and word', (tone, mark, word) => {
    render(<Banner tone={tone}>Text</Banner>);
    // The symbol is hidden from screen readers (the word says it); it is still drawn.
    expect(screen.getByText(mark, { includeHiddenElements: true })).toBeOnTheScreen();
    expect(screen.getByText(word)).toBeOnTheScreen();
  });
});

describe('<Choice />', () => {
  it('marks the chosen option with a check and reports a press', () => {
    const onChange = jest.fn();
    render(<Choice label="Port" testID="port" value="COM1" onChange={onChange} options={[{ value: 'COM1', label: 'COM1' }, { value: 'COM2', label: 'COM2' }]} />);
    expect(screen.getByTestId('port-COM1')).toHaveTextContent('✓ COM1');
    expect(screen.getByTestId('port-COM1')).toBeChecked();
    expect(screen.getByTestId('port-COM2')).not.toBeChecked();
    fireEvent.press(screen.getByTestId('port-COM2'));
    expect(onChange).toHaveBeenCalledWith('COM2');
  });
});
