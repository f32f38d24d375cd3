'use client';

import { useForm, type FieldErrors, type Resolver } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Input } from '@/components/ui/input';
import { Select } from '@/components/ui/select';
import { useToast } from '@/components/ui/toast';
import { monthNames } from '@/lib/format';
import { readNumberText } from '@/lib/number-text';
import { settingsSchema, type SettingsInput } from '@/lib/validations/settings';
import { reachAction } from '@/lib/reach-action';
import { updateSettingsAction } from '../actions';

/** What the fields hold: rates typed as percentages. The schema (shared with the server) sees fractions. */
interface SettingsFields {
  currency: string;
  riskFreeRate: string;
  wacc: string;
  fiscalYearStartMonth: string;
  alertDaysBeforeClose: string;
}

/** The one reading of typed numbers (lib/number-text.ts); what it refuses reaches the schema as NaN, "Enter a number." */
const typed = (v: string) => {
  const read = readNumberText(v);
  return read.ok ? read.value : NaN;
};
const percentToFraction = (v: string) => typed(v) / 100;

function toInput(fields: SettingsFields) {
  return {
    currency: fields.currency,
    riskFreeRate: percentToFraction(fields.riskFreeRate),
    wacc: percentToFraction(fields.wacc),
    fiscalYearStartMonth: Number(fields.fiscalYearStartMonth),
    alertDaysBeforeClose: typed(fields.alertDaysBeforeClose),
  };
}

const resolver: Resolver<SettingsFields> = async (values) => {
  const parsed = settingsSchema.safeParse(toInput(values));
  if (parsed.success) return { values, errors: {} };
  const errors: FieldErrors<SettingsFields> = {};
  for (const issue of parsed.error.issues) {
    const key = issue.path[0] as keyof SettingsFields;
    errors[key] ??= { type: issue.code, message: issue.message };
  }
  return { values: {}, errors };
};

export function SettingsForm({ initial }: { initial: SettingsInput }) {
  const toast = useToast();
  const defaults: SettingsFields = {
    currency: initial.currency,
    riskFreeRate: (initial.riskFreeRate * 100).toFixed(2),
    wacc: (initial.wacc * 100).toFixed(2),
    fiscalYearStartMonth: String(initial.fiscalYearStartMonth),
    alertDaysBeforeClose: String(initial.alertDaysBeforeClose ?? 30),
  };
  const form = useForm<SettingsFields>({ resolver, defaultValues: defaults });
  // register() fills uncontrolled fields only after hydration; defaultValue puts the saved
  // figures in the server-rendered HTML, so nobody sees (or types into) empty fields first.
  const field = (name: keyof SettingsFields) => ({ defaultValue: defaults[name], ...form.register(name) });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = form.handleSubmit(async (fields) => {
    const result = await reachAction(() => updateSettingsAction(toInput(fields)));
    if (result.ok) return toast(result.message, 'success');
    for (const [field, messages] of Object.entries(result.fields ?? {})) form.setError(field as keyof SettingsFields, { message: messages[0] });
    toast(result.message, 'error');
  });
  return (
    <form onSubmit={onSubmit} noValidate className="grid max-w-xl gap-5 sm:grid-cols-2">
      <Input label="Currency" hint="ISO 4217 code, e.g. EUR" maxLength={3} error={errors.currency?.message} {...field('currency')} />
      <Select
        label="Fiscal year starts in"
        options={monthNames.map((m, k) => ({ value: String(k + 1), label: m }))}
        error={errors.fiscalYearStartMonth?.message}
        {...field('fiscalYearStartMonth')}
      />
      <Input
        label="Risk-free rate (% a year)"
        type="number"
        step="0.01"
        inputMode="decimal"
        hint="Continuously compounded; used by the lattice"
        error={errors.riskFreeRate?.message}
        {...field('riskFreeRate')}
      />
      <Input
        label="WACC (% a year)"
        type="number"
        step="0.01"
        inputMode="decimal"
        hint="Default discount rate for cash flows"
        error={errors.wacc?.message}
        {...field('wacc')}
      />
      <Input
        label="Alert before a window closes (days)"
        type="number"
        step="1"
        inputMode="numeric"
        hint="For approved rights being followed"
        error={errors.alertDaysBeforeClose?.message}
        {...field('alertDaysBeforeClose')}
      />
      <div className="sm:col-span-2">
        <Button type="submit" busy={isSubmitting}>
          Save defaults
        </Button>
      </div>
    </form>
  );
}
