import { CHAIN_TRADE_SIZES_IN, inchFractionLabel } from '@app/calc';
import type { BoatDto, BoatInput, HarborDto } from '@app/shared';
import { CHAIN_GRADE_IDS, HULLS } from '@app/shared/values';
import { Controller, useForm, useWatch, type Control, type FieldPath } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TextField } from '@/components/ui/text-field';
import { applyServerErrors } from '@/lib/form-errors';
import { QuantityField } from '@/components/units/quantity-field';
import { SelectField } from '@/components/ui/select-field';
import type { QuantityKind } from '@/lib/units/parse-quantity';
import { lazyResolver } from '@/lib/lazy-schema';

const resolver = lazyResolver((schemas) => schemas.boatInputSchema);

export interface BoatFormProps {
  /** The boat to edit; left out for a new one. */
  boat?: BoatDto;
  harbors: readonly HarborDto[];
  submitLabel: string;
  isPending: boolean;
  /** Saves the profile; rejects with an ApiError whose fields are shown on the form. */
  onSubmit: (input: BoatInput) => Promise<unknown>;
}

type FormValues = BoatInput;
type NumberField = 'loaM' | 'beamM' | 'displacementKg' | 'draftM' | 'bowHeightM';

const HULL_LABELS: Record<(typeof HULLS)[number], string> = {
  sail: 'Sailboat (monohull)',
  power: 'Power boat',
  multihull: 'Multihull',
};

const FIELD_NAMES: readonly FieldPath<FormValues>[] = [
  'name',
  'hull',
  'loaM',
  'beamM',
  'displacementKg',
  'draftM',
  'bowHeightM',
  'gypsy',
  'homeHarborId',
];

function defaults(boat?: BoatDto): FormValues {
  return {
    name: boat?.name ?? '',
    hull: boat?.hull ?? 'sail',
    loaM: boat?.loaM ?? Number.NaN,
    beamM: boat?.beamM ?? null,
    displacementKg: boat?.displacementKg ?? null,
    draftM: boat?.draftM ?? null,
    bowHeightM: boat?.bowHeightM ?? 1,
    gypsy: boat?.gypsy ?? null,
    homeHarborId: boat?.homeHarborId ?? null,
  };
}

interface MeasureProps {
  control: Control<FormValues>;
  name: NumberField;
  label: string;
  kind: QuantityKind;
  required?: boolean;
  hint?: string;
}

/** A measured field wired to the form: empty is null (or missing when required), unreadable is NaN. */
function Measure({ control, name, label, kind, required, hint }: MeasureProps) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <QuantityField
          label={label}
          kind={kind}
          required={required}
          hint={hint}
          name={field.name}
          ref={field.ref}
          onBlur={field.onBlur}
          value={
            typeof field.value === 'number' && Number.isFinite(field.value)
              ? field.value
              : undefined
          }
          onValueChange={(value, state) =>
            field.onChange(
              state === 'ok' ? value : state === 'empty' && !required ? null : Number.NaN,
            )
          }
          error={fieldState.error?.message}
        />
      )}
    />
  );
}

/** A boat profile: name, hull, dimensions in either unit system, windlass gypsy and home harbour. */
export function BoatForm({ boat, harbors, submitLabel, isPending, onSubmit }: BoatFormProps) {
  const {
    register,
    control,
    handleSubmit,
    setError,
    setValue,
    formState: { errors },
  } = useForm<FormValues>({
    resolver,
    defaultValues: defaults(boat),
  });
  const gypsy = useWatch({ control, name: 'gypsy' });

  const submit = handleSubmit(async (input) => {
    try {
      await onSubmit(input);
    } catch (error) {
      applyServerErrors(error, setError, FIELD_NAMES);
    }
  });

  return (
    <form noValidate onSubmit={(event) => void submit(event)} className="flex flex-col gap-4">
      <FormError message={errors.root?.server?.message} />
      <TextField label="Boat name" required error={errors.name?.message} {...register('name')} />
      <SelectField
        label="Hull"
        options={HULLS.map((h) => ({ value: h, label: HULL_LABELS[h] }))}
        error={errors.hull?.message}
        {...register('hull')}
      />
      <div className="grid gap-3 sm:grid-cols-2">
        <Measure
          control={control}
          name="loaM"
          label="Length overall (LOA)"
          kind="length"
          required
        />
        <Measure control={control} name="beamM" label="Beam" kind="length" />
        <Measure
          control={control}
          name="displacementKg"
          label="Displacement"
          kind="mass"
          hint="e.g. 6500 kg or 14,300 lb"
        />
        <Measure control={control} name="draftM" label="Draft" kind="length" />
        <Measure
          control={control}
          name="bowHeightM"
          label="Bow-roller height above the water"
          kind="length"
          required
        />
      </div>
      <fieldset className="grid gap-3 sm:grid-cols-2">
        <legend className="mb-1 text-sm font-bold">Windlass gypsy</legend>
        <SelectField
          label="Gypsy chain grade"
          options={[
            { value: '', label: 'no windlass / not known' },
            ...CHAIN_GRADE_IDS.map((g) => ({ value: g, label: g })),
          ]}
          value={gypsy?.grade ?? ''}
          onChange={(e) => {
            const grade = CHAIN_GRADE_IDS.find((g) => g === e.target.value);
            const sizes = grade ? CHAIN_TRADE_SIZES_IN[grade] : [];
            const size = gypsy?.tradeSizeIn;
            setValue(
              'gypsy',
              grade
                ? {
                    grade,
                    tradeSizeIn:
                      size !== undefined && sizes.includes(size) ? size : (sizes[0] ?? 0.375),
                  }
                : null,
              { shouldDirty: true },
            );
          }}
        />
        {gypsy && (
          <SelectField
            label="Gypsy chain size"
            options={CHAIN_TRADE_SIZES_IN[gypsy.grade].map((s) => ({
              value: String(s),
              label: inchFractionLabel(s),
            }))}
            value={String(gypsy.tradeSizeIn)}
            onChange={(e) =>
              setValue(
                'gypsy',
                { grade: gypsy.grade, tradeSizeIn: Number(e.target.value) },
                { shouldDirty: true },
              )
            }
            error={errors.gypsy?.message}
          />
        )}
      </fieldset>
      <Controller
        control={control}
        name="homeHarborId"
        render={({ field, fieldState }) => (
          <SelectField
            label="Home harbour"
            options={[
              { value: '', label: 'none' },
              ...harbors.map((h) => ({ value: String(h.id), label: h.name })),
            ]}
            name={field.name}
            value={field.value == null ? '' : String(field.value)}
            onChange={(e) => field.onChange(e.target.value === '' ? null : Number(e.target.value))}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        )}
      />
      <Button type="submit" isPending={isPending} pendingLabel="Saving…" className="self-start">
        {submitLabel}
      </Button>
    </form>
  );
}
