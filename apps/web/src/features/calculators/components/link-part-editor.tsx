import { TextField } from '@/components/ui/text-field';
import { QuantityField } from '@/components/units/quantity-field';
import { ChoiceField } from '@/components/ui/choice-field';
import { SelectField } from '@/components/ui/select-field';
import type { LinkPart } from '../utils/link-parts';
import {
  CONSTRUCTION_OPTIONS,
  MATERIAL_OPTIONS,
  SHACKLE_OPTIONS,
  sizeInGrade,
} from '../utils/options';
import { ChainFields } from './chain-fields';

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
    case 'chain':
      return (
        <div className="grid gap-3 sm:grid-cols-2">
          <ChainFields
            gradeLabel={`${name} chain grade`}
            sizeLabel={`${name} chain size`}
            grade={part.grade}
            tradeSizeIn={sizeInGrade(part.grade, part.tradeSizeIn)}
            onGradeChange={(grade) =>
              onChange({ ...part, grade, tradeSizeIn: sizeInGrade(grade, part.tradeSizeIn) })
            }
            onSizeChange={(tradeSizeIn) => onChange({ ...part, tradeSizeIn })}
            sizeError={error}
          />
        </div>
      );
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
          <ChoiceField
            label={`${name} fibre`}
            options={MATERIAL_OPTIONS}
            value={part.material}
            onChoose={(material) => onChange({ ...part, material })}
          />
          <ChoiceField
            label={`${name} construction`}
            options={CONSTRUCTION_OPTIONS}
            value={part.construction}
            onChoose={(construction) => onChange({ ...part, construction })}
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
