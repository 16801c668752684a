// @vitest-environment happy-dom
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import type { ReactNode } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { afterEach, describe, expect, it } from 'vitest';
import { SolidMaterialFields } from './solid-material-fields';

afterEach(cleanup);

function Form({ children }: { children: ReactNode }) {
  const form = useForm({
    defaultValues: { data: { formula: '', analyte: '', purityUncertainty: { shape: 'normal', coverageFactor: 2 } } },
  });
  return <FormProvider {...form}>{children}</FormProvider>;
}

const type = (label: string, value: string) =>
  fireEvent.input(screen.getByRole('textbox', { name: new RegExp(`^${label}`) }), { target: { value } });
const shown = () => screen.getByRole('status', { name: 'Molar mass and analyte' }).textContent;

describe('the solid material form shows the molar mass and the analyte mass fraction as the formula is typed', () => {
  it('Pb(NO3)2 with Pb: M = 331.05 g/mol and w(Pb) = 0.6254 (CIAAW 2021, Pb midpoint 207.04)', async () => {
    render(<SolidMaterialFields />, { wrapper: Form });
    expect(shown()).toMatch(/appear here/);
    type('Formula', 'Pb(NO3)2');
    type('Analyte', 'Pb');
    // 207.04/331.05 = 0.62540 with CIAAW 2021's interval midpoint; handbooks with Pb 207.2 print 0.6256.
    expect(await screen.findByText('M = 331.05 g/mol; Pb is 0.6254 g/g of it')).toBeTruthy();
  });

  it('uses the lot’s atomic weight once it is typed (207.21 g/mol: w(Pb) = 207.21/331.22 = 0.6256)', async () => {
    render(<SolidMaterialFields />, { wrapper: Form });
    type('Formula', 'Pb(NO3)2');
    type('Analyte', 'Pb');
    type('Atomic weight of the analyte', '207.21');
    expect(await screen.findByText('M = 331.22 g/mol; Pb is 0.6256 g/g of it')).toBeTruthy();
  });

  it('says what is wrong with a 0 typed for O while it is typed, with the suggestion', async () => {
    render(<SolidMaterialFields />, { wrapper: Form });
    type('Formula', 'K2Cr207');
    expect(await screen.findByText(/Did you mean "K2Cr2O7"\?/)).toBeTruthy();
    expect(shown()).not.toMatch(/M =/);
  });
});
