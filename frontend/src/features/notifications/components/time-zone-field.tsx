import { useMemo } from 'react';
import { Autocomplete, TextField } from '@mui/material';
import { getTimeZones } from '@vvo/tzdb';

interface ZoneOption {
  name: string;
  label: string;
  /** Other names of the same zone (older IANA names such as Asia/Calcutta), for searching. */
  search: string;
}

/**
 * IANA zones under their current names, with offset and main cities, from @vvo/tzdb: the browser's own list
 * (`Intl.supportedValuesOf`) gives CLDR's older names (Asia/Calcutta, Europe/Kiev) and leaves out UTC.
 */
function zoneOptions(current: string): ZoneOption[] {
  const zones = getTimeZones().map((z) => ({
    name: z.name,
    label: `${z.name} (${z.rawFormat})`,
    search: [...z.group, ...z.mainCities].join(' '),
  }));
  const extra = ['UTC', current].filter((n) => !zones.some((z) => z.name === n || z.search.split(' ').includes(n)));
  return [...new Set(extra)].map((name) => ({ name, label: name, search: name })).concat(zones);
}

interface Props {
  value: string;
  isDefault: boolean;
  onChange: (zone: string) => void;
  disabled?: boolean;
}

/** The zone mail dates are written in; until one is chosen, the server's. */
export function TimeZoneField({ value, isDefault, onChange, disabled }: Props) {
  const options = useMemo(() => zoneOptions(value), [value]);
  const selected = options.find((o) => o.name === value || o.search.split(' ').includes(value)) ?? null;
  return (
    <Autocomplete
      options={options}
      value={selected}
      disableClearable={selected !== null}
      disabled={disabled}
      getOptionLabel={(o) => o.label}
      isOptionEqualToValue={(a, b) => a.name === b.name}
      filterOptions={(all, { inputValue }) => {
        const words = inputValue
          .toLowerCase()
          .split(/[\s/]+/)
          .filter(Boolean);
        return all.filter((o) => words.every((w) => `${o.label} ${o.search}`.toLowerCase().includes(w))).slice(0, 50);
      }}
      onChange={(_, option) => option && option.name !== value && onChange(option.name)}
      sx={{ maxWidth: 520 }}
      renderInput={(params) => (
        <TextField
          {...params}
          label="Time zone of dates in your e-mails"
          helperText={isDefault ? `The server's zone until you choose yours.` : 'Type a city or a zone name, e.g. Mumbai or New_York.'}
        />
      )}
    />
  );
}
