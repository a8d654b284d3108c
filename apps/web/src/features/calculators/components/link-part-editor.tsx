import { CHAIN_GRADES, CHAIN_TRADE_SIZES_IN, ROPE_CONSTRUCTIONS, ROPE_MATERIALS } from '@app/calc';
import { TextField } from '@/components/ui/text-field';
import { QuantityField } from '@/components/units/quantity-field';
import { SelectField } from '@/components/ui/select-field';
import type { LinkPart } from '../utils/link-parts';
import {
  CONSTRUCTION_OPTIONS,
  GRADE_OPTIONS,
  MATERIAL_OPTIONS,
  SHACKLE_OPTIONS,
  chainSizeOptions,
  pick,
} from '../utils/options';

export interface LinkPartEditorProps {
  part: LinkPart;
  onChange: (part: LinkPart) => void;
  /** The rating's complaint about this part, if any. */
  error?: string;
  /** "Part 2" etc., so every field's name is unique on the page. */
  name: string;
}

/** The fields of one part of the weakest-link builder. */
export function LinkPartEditor({ part, onChange, error, name }: LinkPartEditorProps) {
  switch (part.kind) {
    case 'chain': {
      const sizes = CHAIN_TRADE_SIZES_IN[part.grade];
      return (
        <div className="grid gap-3 sm:grid-cols-2">
          <SelectField
            label={`${name} chain grade`}
            options={GRADE_OPTIONS}
            value={part.grade}
            onChange={(e) => {
              const grade = pick(e.target.value, CHAIN_GRADES, 'G43');
              const tradeSizeIn = CHAIN_TRADE_SIZES_IN[grade].includes(part.tradeSizeIn)
                ? part.tradeSizeIn
                : (CHAIN_TRADE_SIZES_IN[grade][0] ?? part.tradeSizeIn);
              onChange({ ...part, grade, tradeSizeIn });
            }}
          />
          <SelectField
            label={`${name} chain size`}
            options={chainSizeOptions(part.grade)}
            value={String(sizes.includes(part.tradeSizeIn) ? part.tradeSizeIn : sizes[0])}
            onChange={(e) => onChange({ ...part, tradeSizeIn: Number(e.target.value) })}
            error={error}
          />
        </div>
      );
    }
    case 'shackle':
      return (
        <SelectField
          label={`${name} shackle size`}
          options={SHACKLE_OPTIONS}
          value={String(part.nominalIn)}
          onChange={(e) => onChange({ ...part, nominalIn: Number(e.target.value) })}
          error={error}
        />
      );
    case 'rope':
      return (
        <div className="grid gap-3 sm:grid-cols-3">
          <SelectField
            label={`${name} fibre`}
            options={MATERIAL_OPTIONS}
            value={part.material}
            onChange={(e) =>
              onChange({ ...part, material: pick(e.target.value, ROPE_MATERIALS, 'nylon') })
            }
          />
          <SelectField
            label={`${name} construction`}
            options={CONSTRUCTION_OPTIONS}
            value={part.construction}
            onChange={(e) =>
              onChange({
                ...part,
                construction: pick(e.target.value, ROPE_CONSTRUCTIONS, 'three-strand'),
              })
            }
          />
          <QuantityField
            label={`${name} diameter`}
            kind="diameter"
            value={part.diameterM}
            onValueChange={(diameterM) => onChange({ ...part, diameterM })}
            error={error}
          />
        </div>
      );
    case 'custom':
      return (
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField
            label={`${name} name`}
            value={part.label}
            maxLength={60}
            onChange={(e) => onChange({ ...part, label: e.target.value })}
          />
          <QuantityField
            label={`${name} working load limit`}
            kind="force"
            value={part.wllN}
            onValueChange={(wllN) => onChange({ ...part, wllN })}
            hint="From the maker's marking"
            error={error}
          />
          <QuantityField
            label={`${name} breaking strength`}
            kind="force"
            value={part.minBreakN}
            onValueChange={(minBreakN) => onChange({ ...part, minBreakN })}
            hint="From the maker's data"
          />
        </div>
      );
  }
}
