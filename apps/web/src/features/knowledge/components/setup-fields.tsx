import { ANCHOR_KINDS, CHAIN_GRADE_IDS, HULLS } from '@app/shared/values';
import { TextField } from '@/components/ui/text-field';
import type { SetupValues } from './setup-values';

function Select({
  label,
  value,
  options,
  onChange,
}: {
  label: string;
  value: string;
  options: readonly string[];
  onChange: (v: string) => void;
}) {
  return (
    <label className="flex flex-col gap-1 text-sm font-bold text-ink-900">
      {label}
      <select
        value={value}
        onChange={(e) => onChange(e.target.value)}
        className="min-h-11 rounded-md border border-sand-500 bg-sand-50 px-2 font-normal"
      >
        {options.map((o) => (
          <option key={o} value={o}>
            {o}
          </option>
        ))}
      </select>
    </label>
  );
}

/** The fields of a tackle setup block; `errors` are the server's messages keyed by `setup.…` paths. */
export function SetupFields({
  value,
  onChange,
  errors,
}: {
  value: SetupValues;
  onChange: (v: SetupValues) => void;
  errors: Record<string, string>;
}) {
  const set = (key: keyof SetupValues) => (e: { target: { value: string } }) =>
    onChange({ ...value, [key]: e.target.value });
  const err = (prefix: string) => Object.entries(errors).find(([k]) => k.startsWith(prefix))?.[1];
  const num = { type: 'number', inputMode: 'decimal' as const, step: 'any' };
  return (
    <fieldset className="grid grid-cols-1 gap-3 rounded-md border border-sand-500 p-3 sm:grid-cols-3">
      <legend className="px-1 text-sm font-bold">Tackle setup (SI units)</legend>
      <TextField label="Boat name or type" value={value.label} onChange={set('label')} />
      <Select
        label="Hull"
        value={value.hull}
        options={HULLS}
        onChange={(v) => onChange({ ...value, hull: v })}
      />
      <TextField
        label="Length overall (m)"
        {...num}
        value={value.loaM}
        onChange={set('loaM')}
        error={err('setup.boat.loaM')}
      />
      <TextField
        label="Beam (m)"
        {...num}
        value={value.beamM}
        onChange={set('beamM')}
        error={err('setup.boat.beamM')}
      />
      <TextField
        label="Bow-roller height (m)"
        {...num}
        value={value.bowHeightM}
        onChange={set('bowHeightM')}
      />
      <TextField
        label="Design wind (kn)"
        {...num}
        value={value.windKn}
        onChange={set('windKn')}
        error={err('setup.windKn')}
      />
      <TextField
        label="Depth (m)"
        {...num}
        value={value.depthM}
        onChange={set('depthM')}
        error={err('setup.depthM')}
      />
      <TextField label="Tidal rise (m)" {...num} value={value.tideM} onChange={set('tideM')} />
      <Select
        label="Anchor type"
        value={value.anchorType}
        options={ANCHOR_KINDS}
        onChange={(v) => onChange({ ...value, anchorType: v })}
      />
      <TextField
        label="Anchor mass (kg)"
        {...num}
        value={value.anchorKg}
        onChange={set('anchorKg')}
        error={err('setup.components.anchor')}
      />
      <Select
        label="Chain grade"
        value={value.chainGrade}
        options={CHAIN_GRADE_IDS}
        onChange={(v) => onChange({ ...value, chainGrade: v })}
      />
      <TextField
        label="Chain trade size (in)"
        {...num}
        value={value.chainIn}
        onChange={set('chainIn')}
        error={err('setup.components.chain')}
      />
      <TextField label="Chain length (m)" {...num} value={value.chainM} onChange={set('chainM')} />
      <TextField
        label="Nylon snubber diameter (mm)"
        {...num}
        value={value.snubberMm}
        onChange={set('snubberMm')}
        error={err('setup.components.snubber')}
      />
      <TextField
        label="Snubber length (m)"
        {...num}
        value={value.snubberM}
        onChange={set('snubberM')}
      />
      <TextField
        label="Anchor shackle size (in)"
        {...num}
        value={value.shackleIn}
        onChange={set('shackleIn')}
        error={err('setup.components.connectors')}
      />
    </fieldset>
  );
}
