import { fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { QuantityField } from './QuantityField';

function Mass({ error }: { error?: string }) {
  const [text, setText] = useState('1 kg');
  return (
    <QuantityField
      name="m"
      label="Particle mass"
      value={text}
      onChangeText={setText}
      defaultText="1 kg"
      unit="kg"
      presets={[
        { label: 'electron', value: '9.1093837139e-31 kg' },
        { label: 'proton', value: '1.67262192595e-27 kg' },
      ]}
      error={error}
      reading="1000 g"
    />
  );
}

describe('QuantityField', () => {
  it('puts a preset into the field and marks it as the one chosen', () => {
    render(<Mass />);
    const proton = screen.getByTestId('preset-m-1');
    expect(proton.getAttribute('aria-pressed')).toBe('false');
    fireEvent.click(proton);
    expect((screen.getByTestId('input-m') as HTMLInputElement).value).toBe('1.67262192595e-27 kg');
    expect(screen.getByTestId('preset-m-1').getAttribute('aria-pressed')).toBe('true');
    expect(screen.getByTestId('preset-m-0').getAttribute('aria-pressed')).toBe('false');
  });

  it('names the unit a bare number is read in, and ties its hint and error to the input', () => {
    render(<Mass error="Particle mass: a value is needed." />);
    const input = screen.getByTestId('input-m');
    expect(input.getAttribute('aria-label')).toBe('Particle mass');
    const described = input.getAttribute('aria-describedby')!.split(' ').map((id) => document.getElementById(id)?.textContent);
    expect(described[0]).toContain('a number alone is read in kg');
    expect(described[1]).toBe('Particle mass: a value is needed.');
    expect(screen.getByTestId('input-m-error').textContent).toBe('Particle mass: a value is needed.');
    // While the value cannot be read, it is not said how it was read.
    expect(screen.queryByTestId('input-m-reading')).toBeNull();
  });

  it('says how a value with a unit was read', () => {
    render(<Mass />);
    expect(screen.getByTestId('input-m-reading').textContent).toBe('Read as 1000 g');
  });
});
