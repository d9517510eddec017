import { describe, expect, it } from 'vitest';
import type { ReactNode } from 'react';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { FormProvider, useForm } from 'react-hook-form';
import { EluentBuilder } from '../../src/features/records/components/eluent-builder';
import { SpotsTable } from '../../src/features/records/components/spots-table';
import { emptyRecordForm, type RecordFormValues } from '../../src/features/records/components/record-form-values';

function WithForm({ children, values }: { children: ReactNode; values?: Partial<RecordFormValues> }) {
  const form = useForm<RecordFormValues>({ defaultValues: { ...emptyRecordForm(), ...values } });
  return <FormProvider {...form}>{children}</FormProvider>;
}

const summary = () => screen.getByTestId('eluent-summary').textContent ?? '';

describe('EluentBuilder', () => {
  it(
    'when the form starts with EtOAc 1 : hexanes 4, then each solvent shows its % v/v and EtOAc is ' +
      'named the strong solvent at 20 %',
    () => {
      render(
        <WithForm>
          <EluentBuilder />
        </WithForm>,
      );
      const rows = screen.getAllByRole('group', { name: /^Solvent \d of the eluent$/ });
      expect(rows).toHaveLength(2);
      expect(rows[0]).toHaveTextContent('20 %');
      expect(rows[1]).toHaveTextContent('80 %');
      // 1 part in 5 = 20 % v/v; EtOAc has the larger Snyder ε° on silica (0.48, Sadek p. 74, vs about 0.01 from memory).
      expect(summary()).toContain('EtOAc : hexanes 1 : 4');
      expect(summary()).toMatch(/20 %\s*EtOAc \(the stronger solvent/);
    },
  );

  it('when the parts change to 1 : 1, then the percentages and the notation follow', async () => {
    render(
      <WithForm>
        <EluentBuilder />
      </WithForm>,
    );
    const hexanes = screen.getByLabelText('Parts of solvent 2');
    await userEvent.clear(hexanes);
    await userEvent.type(hexanes, '1');
    expect(summary()).toContain('EtOAc : hexanes 1 : 1');
    expect(summary()).toMatch(/50 %\s*EtOAc/);
  });

  it('when a part is emptied, then the builder asks for a positive number instead of showing a ratio', async () => {
    render(
      <WithForm>
        <EluentBuilder />
      </WithForm>,
    );
    await userEvent.clear(screen.getByLabelText('Parts of solvent 1'));
    expect(summary()).toMatch(/positive number of parts/);
  });

  it('when an additive is added, then the notation carries it in % v/v', async () => {
    render(
      <WithForm>
        <EluentBuilder />
      </WithForm>,
    );
    await userEvent.click(screen.getByRole('button', { name: 'Add additive' }));
    expect(summary()).toContain('+ 1% Et3N');
  });

  it('when the mode is switched to gradient, then steps with column volumes can be added', async () => {
    render(
      <WithForm>
        <EluentBuilder />
      </WithForm>,
    );
    await userEvent.click(screen.getByLabelText('gradient'));
    await userEvent.click(screen.getByRole('button', { name: 'Add step' }));
    expect(screen.getByLabelText('Step 1, column volumes')).toHaveValue(3);
    expect(screen.getByLabelText('Step 1, parts of EtOAc')).toHaveValue(1);
  });
});

describe('SpotsTable', () => {
  it(
    'when distances are measured, then Rf = spot ÷ front is previewed (the definition of Rf, common ' +
      'practice), and a spot beyond the front is explained',
    async () => {
      render(
        <WithForm>
          <SpotsTable />
        </WithForm>,
      );
      await userEvent.click(screen.getByLabelText('measure distances (mm)'));
      await userEvent.type(screen.getByLabelText('Spot 1 distance from origin (mm)'), '14');
      await userEvent.type(screen.getByLabelText('Spot 1 solvent front distance (mm)'), '50');
      expect(screen.getByText('Rf 0.28')).toBeInTheDocument();
      await userEvent.clear(screen.getByLabelText('Spot 1 distance from origin (mm)'));
      await userEvent.type(screen.getByLabelText('Spot 1 distance from origin (mm)'), '55');
      expect(screen.getByText(/beyond the solvent front/)).toBeInTheDocument();
    },
  );
});
