import { topicInputSchema } from '../../../lib/schemas';

/** A topic's name and description (loaded lazily with zod). */
export const fieldsSchema = topicInputSchema.pick({ name: true, description: true });
