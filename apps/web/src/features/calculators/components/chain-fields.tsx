import type { ChainGrade } from '@app/calc';
import { ChoiceField } from '@/components/ui/choice-field';
import { SelectField } from '@/components/ui/select-field';
import { GRADE_OPTIONS, chainSizeOptions } from '../utils/options';

export interface ChainFieldsProps {
  gradeLabel: string;
  sizeLabel: string;
  grade: ChainGrade;
  /** A size the grade's table holds (`sizeInGrade`). */
  tradeSizeIn: number;
  onGradeChange: (grade: ChainGrade) => void;
  onSizeChange: (tradeSizeIn: number) => void;
  sizeError?: string | undefined;
}

/** A chain's grade and, from that grade's table, its trade size. */
export function ChainFields({
  gradeLabel,
  sizeLabel,
  grade,
  tradeSizeIn,
  onGradeChange,
  onSizeChange,
  sizeError,
}: ChainFieldsProps) {
  return (
    <>
      <ChoiceField
        label={gradeLabel}
        options={GRADE_OPTIONS}
        value={grade}
        onChoose={onGradeChange}
      />
      <SelectField
        label={sizeLabel}
        options={chainSizeOptions(grade)}
        value={String(tradeSizeIn)}
        onChange={(e) => onSizeChange(Number(e.target.value))}
        error={sizeError}
      />
    </>
  );
}
