import type { ListingInput } from '@app/shared';
import {
  ANCHOR_KINDS,
  CHAIN_GRADE_IDS,
  CURRENCIES,
  GALVANIZING_STATES,
  LISTING_CATEGORIES,
  LISTING_CATEGORY_LABELS,
  LISTING_CONDITIONS,
  LISTING_CONDITION_LABELS,
  LISTING_CONNECTOR_KINDS,
  MOORING_ITEMS,
  ROPE_CONSTRUCTION_IDS,
  ROPE_MATERIAL_IDS,
  WINDLASS_PARTS,
} from '@app/shared/values';
import { useRef, type ReactNode } from 'react';
import { useForm, useWatch, type FieldErrors } from 'react-hook-form';
import { Alert } from '@/components/ui/alert';
import { Button, type ButtonVariant } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { lazyResolver } from '@/lib/lazy-schema';
import { formSchema, type ListingFormValues } from '../utils/listing-form-values';

const resolver = lazyResolver(formSchema);
import { ExchangeSelect } from './select';

const opts = (values: readonly string[], labels?: Record<string, string>) =>
  values.map((v) => ({ value: v, label: labels?.[v] ?? v.replace(/-/g, ' ') }));
const BLANK = { value: '', label: '—' };

export interface ListingFormAction {
  /** Passed to onSubmit, so one form can save a draft or publish. */
  intent: string;
  label: string;
  variant?: ButtonVariant;
}

export interface ListingFormProps {
  initial: ListingFormValues;
  harbors: ReadonlyArray<{ id: number; name: string }>;
  /** One submit button (intent "save"), unless `actions` names several. */
  submitLabel?: string;
  actions?: readonly ListingFormAction[];
  isPending: boolean;
  serverError?: { message: string; fields: Record<string, string> } | null;
  onSubmit: (input: ListingInput, intent: string) => void;
  /** Shown above the buttons (the new-listing form's photo picker). */
  children?: ReactNode;
}

function errorAt(
  errors: FieldErrors,
  path: string,
  server: Record<string, string>,
): string | undefined {
  let node: unknown = errors;
  for (const part of path.split('.')) node = (node as Record<string, unknown> | undefined)?.[part];
  const msg = (node as { message?: unknown } | undefined)?.message;
  return typeof msg === 'string' ? msg : server[path];
}

/** Create or edit a listing: common fields, then the typed specs of the chosen category. */
export function ListingForm({
  initial,
  harbors,
  submitLabel = 'Save',
  actions,
  isPending,
  serverError,
  onSubmit,
  children,
}: ListingFormProps) {
  const intent = useRef('save');
  const buttons = actions ?? [{ intent: 'save', label: submitLabel }];
  const form = useForm({ resolver, defaultValues: initial });
  const { register, handleSubmit, control, formState } = form;
  const category = useWatch({ control, name: 'category' });
  const server = serverError?.fields ?? {};
  const err = (p: string) => errorAt(formState.errors, p, server);
  const spec = (key: string) => register(`specs.${key}`);
  const inchField = (key: string, label: string, hint: string) => (
    <TextField
      label={label}
      autoComplete="off"
      hint={hint}
      error={err(`specs.${key}`)}
      {...spec(key)}
    />
  );
  const numField = (key: string, label: string, step = 'any', hint?: string) => (
    <TextField
      label={label}
      type="number"
      step={step}
      inputMode="decimal"
      hint={hint}
      error={err(`specs.${key}`)}
      {...spec(key)}
    />
  );
  return (
    <form
      noValidate
      onSubmit={(e) => void handleSubmit((v) => onSubmit(v as ListingInput, intent.current))(e)}
      className="flex flex-col gap-4"
    >
      {serverError && Object.keys(server).length === 0 && (
        <Alert tone="error">{serverError.message}</Alert>
      )}
      <ExchangeSelect
        label="Category"
        error={err('category')}
        options={opts(LISTING_CATEGORIES, LISTING_CATEGORY_LABELS)}
        {...register('category')}
      />
      <TextField label="Title" required error={err('title')} {...register('title')} />
      <div className="flex flex-col gap-1">
        <label htmlFor="listing-description" className="text-sm font-bold text-ink-900">
          Description
        </label>
        <textarea
          id="listing-description"
          rows={5}
          aria-invalid={err('description') ? true : undefined}
          aria-describedby={err('description') ? 'listing-description-error' : undefined}
          className="w-full rounded-md border border-sand-500 bg-sand-50 p-3 text-base"
          {...register('description')}
        />
        {err('description') && (
          <p id="listing-description-error" className="text-sm font-bold text-flare-700">
            {err('description')}
          </p>
        )}
      </div>
      <fieldset className="grid grid-cols-1 gap-3 rounded-md border border-sand-300 p-3 sm:grid-cols-2">
        <legend className="px-1 text-sm font-bold">Specifications</legend>
        {category === 'anchor' && (
          <>
            <ExchangeSelect
              label="Anchor type"
              error={err('specs.anchorType')}
              options={[BLANK, ...opts(ANCHOR_KINDS, { scoop: 'scoop / roll-bar' })]}
              {...spec('anchorType')}
            />
            {numField('massKg', 'Mass (kg)')}
          </>
        )}
        {(category === 'chain' || category === 'windlass') && (
          <>
            {category === 'windlass' && (
              <ExchangeSelect
                label="Part"
                error={err('specs.part')}
                options={[BLANK, ...opts(WINDLASS_PARTS)]}
                {...spec('part')}
              />
            )}
            <ExchangeSelect
              label="Chain grade"
              error={err('specs.grade')}
              options={[BLANK, ...opts(CHAIN_GRADE_IDS)]}
              {...spec('grade')}
            />
            {inchField(
              'tradeSizeIn',
              'Trade size (in)',
              'A fraction such as 5/16 or 3/8 (decimals work too). Leave empty for metric.',
            )}
            {numField('nominalMm', 'Metric size (mm)', 'any', 'Leave empty for a trade size.')}
            {category === 'chain' && numField('lengthM', 'Length (m)')}
            {category === 'chain' && (
              <ExchangeSelect
                label="Galvanising"
                error={err('specs.galvanizing')}
                options={[BLANK, ...opts(GALVANIZING_STATES)]}
                {...spec('galvanizing')}
              />
            )}
          </>
        )}
        {(category === 'rode' || category === 'snubber') && (
          <>
            <ExchangeSelect
              label="Material"
              error={err('specs.material')}
              options={[BLANK, ...opts(ROPE_MATERIAL_IDS)]}
              {...spec('material')}
            />
            {category === 'rode' && (
              <ExchangeSelect
                label="Construction"
                error={err('specs.construction')}
                options={[BLANK, ...opts(ROPE_CONSTRUCTION_IDS)]}
                {...spec('construction')}
              />
            )}
            {numField('diameterMm', 'Diameter (mm)')}
            {numField('lengthM', 'Length (m)')}
            {category === 'snubber' && (
              <ExchangeSelect
                label="Bridle"
                options={[
                  { value: 'false', label: 'Single snubber' },
                  { value: 'true', label: 'Bridle' },
                ]}
                {...spec('bridle')}
              />
            )}
          </>
        )}
        {category === 'connector' && (
          <>
            <ExchangeSelect
              label="Kind"
              error={err('specs.kind')}
              options={[BLANK, ...opts(LISTING_CONNECTOR_KINDS)]}
              {...spec('kind')}
            />
            {inchField('nominalIn', 'Size (in)', 'Shackle size as a fraction, e.g. 3/8 or 1/2.')}
            {numField('wllN', 'Marked working load (N)', 'any', 'Only what is marked on the part.')}
          </>
        )}
        {category === 'mooring' && (
          <>
            <ExchangeSelect
              label="Item"
              error={err('specs.item')}
              options={[BLANK, ...opts(MOORING_ITEMS)]}
              {...spec('item')}
            />
            {numField('massKg', 'Mass (kg)')}
          </>
        )}
        {category === 'other' && (
          <p className="text-sm text-ink-700">No specifications for this category.</p>
        )}
      </fieldset>
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-3">
        <ExchangeSelect
          label="Condition"
          error={err('condition')}
          options={opts(LISTING_CONDITIONS, LISTING_CONDITION_LABELS)}
          {...register('condition')}
        />
        <TextField
          label="Price"
          type="number"
          min="0"
          step="0.01"
          inputMode="decimal"
          error={err('priceCents')}
          {...register('price')}
        />
        <ExchangeSelect
          label="Currency"
          error={err('currency')}
          options={opts(CURRENCIES)}
          {...register('currency')}
        />
      </div>
      <ExchangeSelect
        label="Harbour"
        error={err('harborId')}
        options={[BLANK, ...harbors.map((h) => ({ value: String(h.id), label: h.name }))]}
        {...register('harborId')}
      />
      <p className="text-sm text-ink-700">
        Describe wear honestly. Buyers rely on markings and their own inspection; ratings shown on
        Rodewise are for new gear.
      </p>
      {children}
      <div className="flex flex-wrap gap-2">
        {buttons.map((b) => (
          <Button
            key={b.intent}
            type="submit"
            variant={b.variant ?? 'primary'}
            isPending={isPending}
            pendingLabel="Saving…"
            onClick={() => {
              intent.current = b.intent;
            }}
          >
            {b.label}
          </Button>
        ))}
      </div>
    </form>
  );
}
