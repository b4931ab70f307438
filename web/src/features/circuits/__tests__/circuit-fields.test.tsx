// @vitest-environment happy-dom
import { cleanup, render, screen, within } from '@testing-library/react';
import { CIRCUIT_KIND_WORDS, PROTECTIVE_DEVICE_WORDS } from '@wiretrail/core';
import { useForm } from 'react-hook-form';
import { afterEach, describe, expect, it } from 'vitest';
import { type CircuitDetails, CircuitDetailFields, circuitDetailsOf } from '../phone/circuit-fields';

function Details() {
  const { register, formState } = useForm<CircuitDetails>({ defaultValues: circuitDetailsOf(null) });
  return <CircuitDetailFields register={register} errors={formState.errors} />;
}

afterEach(cleanup);

describe("the phone's circuit details", () => {
  it("offers the kinds and protective devices in core's words, as the office names them", () => {
    render(<Details />);
    const options = (label: string) => within(screen.getByLabelText(label)).getAllByRole('option').map((o) => o.textContent);
    expect(options('Kind')).toEqual(Object.values(CIRCUIT_KIND_WORDS));
    expect(options('Protective device')).toEqual(['Not known', ...Object.values(PROTECTIVE_DEVICE_WORDS)]);
    expect(options('Protective device')).toContain('BS 3036 semi-enclosed fuse');
  });
});
