// The wizard's network step offers the kit's serial settings when the fields differ from them
// (a kit picked after the fields were filled), and says nothing when they match.
import { fireEvent, render, screen } from '@testing-library/react-native';
import { useForm } from 'react-hook-form';
import { NetworkStep } from '@/components/wizard/network-step';
import type { WizardForm } from '@/components/wizard/wizard-schema';
import type { Kit } from '@/hooks/use-kits';

const kit = { id: 1, name: 'Threadline 2.1', programPath: 'C:\\THREAD\\TLRES.COM', programArgs: '/Q', baud: 9600, parity: 'N', dataBits: 8, stopBits: 1 } as unknown as Kit;

function Harness({ values, onUseKit }: { values: Partial<WizardForm>; onUseKit: (k: Kit) => void }) {
  const { control } = useForm<WizardForm>({
    defaultValues: { ports: [{ name: 'COM1', present: true, attached: 'adapter' }], networkPort: 'COM1', stationArgs: '/S:1', redirectFrom: 'LPT1', loadHigh: 'auto', ...values } as unknown as WizardForm,
  });
  return <NetworkStep control={control} kit={kit} onUseKit={onUseKit} />;
}

describe('<NetworkStep />', () => {
  it('offers the kit settings when the serial fields differ, and hands the kit over', () => {
    const onUseKit = jest.fn();
    render(<Harness values={{ baud: 2400, parity: 'E', dataBits: 7, stopBits: 1 }} onUseKit={onUseKit} />);
    expect(screen.getByTestId('net-kit-differs')).toHaveTextContent(/9600 baud, parity N, 8 data bits, 1 stop bit/);
    fireEvent.press(screen.getByTestId('net-use-kit'));
    expect(onUseKit).toHaveBeenCalledWith(kit);
  });

  it('stays quiet when the fields already match the kit', () => {
    render(<Harness values={{ baud: 9600, parity: 'N', dataBits: 8, stopBits: 1 }} onUseKit={jest.fn()} />);
    expect(screen.queryByTestId('net-kit-differs')).toBeNull();
  });
});
