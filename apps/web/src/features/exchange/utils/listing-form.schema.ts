import { listingInputSchema, z } from '../../../lib/schemas';
import { toListingInput, type ListingFormValues } from './listing-form-values';

/** The shared listing schema behind a converter from typed strings. */
export const formSchema = z
  .custom<ListingFormValues>((v) => typeof v === 'object' && v !== null)
  .transform(toListingInput)
  .pipe(listingInputSchema);
