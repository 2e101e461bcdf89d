import type { ReactNode } from 'react';
import { FormControlLabel, Paper, Stack, Switch, TextField, Typography } from '@mui/material';
import type { FieldErrors, SettingsForm } from './settings-form-model.js';

export interface FieldProps {
  form: SettingsForm;
  errors: FieldErrors;
  set: (patch: Partial<SettingsForm>) => void;
  readOnly: boolean;
}

type TextKey = { [K in keyof SettingsForm]: SettingsForm[K] extends string ? K : never }[keyof SettingsForm];
type BoolKey = { [K in keyof SettingsForm]: SettingsForm[K] extends boolean ? K : never }[keyof SettingsForm];

export function Section({ title, intro, children }: { title: string; intro: ReactNode; children: ReactNode }) {
  return (
    <Paper variant="outlined" component="section" sx={{ p: 3 }} aria-label={title}>
      <Typography variant="h3" component="h2">
        {title}
      </Typography>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
        {intro}
      </Typography>
      <Stack spacing={2.5}>{children}</Stack>
    </Paper>
  );
}

interface TextRowProps extends FieldProps {
  name: TextKey;
  label: string;
  help: ReactNode;
  multiline?: boolean;
  type?: 'text' | 'number';
  step?: number;
}

export function TextRow({ form, errors, set, readOnly, name, label, help, multiline, type = 'text', step }: TextRowProps) {
  return (
    <TextField
      label={label}
      value={form[name]}
      onChange={(e) => set({ [name]: e.target.value } as Partial<SettingsForm>)}
      error={Boolean(errors[name])}
      helperText={errors[name] ?? help}
      multiline={multiline}
      minRows={multiline ? 2 : undefined}
      type={type}
      slotProps={{ htmlInput: { step, readOnly } }}
      fullWidth
    />
  );
}

interface SwitchRowProps extends FieldProps {
  name: BoolKey;
  label: string;
  help: ReactNode;
}

export function SwitchRow({ form, set, readOnly, name, label, help }: SwitchRowProps) {
  return (
    <div>
      <FormControlLabel
        label={label}
        disabled={readOnly}
        control={<Switch checked={form[name]} onChange={(e) => set({ [name]: e.target.checked } as Partial<SettingsForm>)} />}
      />
      <Typography variant="caption" color="text.secondary" component="p" sx={{ ml: 6, mt: -0.5 }}>
        {help}
      </Typography>
    </div>
  );
}
