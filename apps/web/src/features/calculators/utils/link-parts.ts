import {
  chainGradeWords,
  chainSpec,
  inchFractionLabel,
  ropeSpec,
  shackleSpec,
  withFieldPrefix,
  type ChainGrade,
  type RatedComponent,
  type RopeConstruction,
  type RopeMaterial,
} from '@app/calc';

/** A part the weakest-link builder can rate. */
export type LinkPart =
  | { kind: 'chain'; grade: ChainGrade; tradeSizeIn: number }
  | { kind: 'shackle'; nominalIn: number }
  | {
      kind: 'rope';
      material: RopeMaterial;
      construction: RopeConstruction;
      diameterM: number | undefined;
    }
  | {
      kind: 'custom';
      label: string;
      wllN: number | undefined;
      minBreakN: number | undefined;
    };

export type LinkPartKind = LinkPart['kind'];

/** A fresh part of a kind, with everyday sizes. */
export function newPart(kind: LinkPartKind): LinkPart {
  switch (kind) {
    case 'chain':
      return { kind, grade: 'G43', tradeSizeIn: 3 / 8 };
    case 'shackle':
      return { kind, nominalIn: 7 / 16 };
    case 'rope':
      return { kind, material: 'nylon', construction: 'three-strand', diameterM: 0.0159 };
    case 'custom':
      return { kind, label: 'swivel', wllN: undefined, minBreakN: undefined };
  }
}

/**
 * Rates one part from the tables (chain, shackle, wet rope) or from the maker's figures (custom);
 * throws the calc library's RangeError, with `parts[i]` prefixed to the field, when it cannot.
 */
export function ratePart(part: LinkPart, index: number): RatedComponent {
  return withFieldPrefix(`parts[${index}]`, () => {
    switch (part.kind) {
      case 'chain': {
        const spec = chainSpec({ grade: part.grade, tradeSizeIn: part.tradeSizeIn });
        return {
          label: `${inchFractionLabel(part.tradeSizeIn)} ${chainGradeWords(part.grade)} chain`,
          ...spec,
        };
      }
      case 'shackle':
        return {
          label: `${inchFractionLabel(part.nominalIn)} shackle`,
          ...shackleSpec({ nominalIn: part.nominalIn }),
        };
      case 'rope': {
        const spec = ropeSpec({
          material: part.material,
          construction: part.construction,
          diameterMm: (part.diameterM ?? Number.NaN) * 1000,
          wet: true,
        });
        return { label: `${part.material} ${part.construction} rope`, ...spec };
      }
      case 'custom':
        return {
          label: part.label.trim() === '' ? 'unnamed part' : part.label.trim(),
          wllN: part.wllN ?? Number.NaN,
          minBreakN: part.minBreakN ?? Number.NaN,
        };
    }
  });
}
