import { Topic } from '../../../models';

/** The starting topics (the migration inserts them; tests empty every table, so they put them back). */
export async function seedTopics() {
  const names = ['Anchoring', 'Rode and chain', 'Snubbers and bridles', 'Storm preparation'];
  const out: Topic[] = [];
  for (const [i, name] of names.entries())
    out.push(
      await Topic.create({ name, slug: name.toLowerCase().replace(/\s+/g, '-'), position: i }),
    );
  return out;
}

/** A small Tiptap document: a heading and paragraphs. */
export const docOf = (heading: string, ...paragraphs: string[]) => ({
  type: 'doc',
  content: [
    { type: 'heading', attrs: { level: 2 }, content: [{ type: 'text', text: heading }] },
    ...paragraphs.map((text) => ({ type: 'paragraph', content: [{ type: 'text', text }] })),
  ],
});

/** A setup for a 9.75 m sloop in 30 kn (the tackle-plans test uses the same boat). */
export const SETUP = {
  boat: { label: 'Test sloop', hull: 'sail', loaM: 9.75, beamM: 3.35, bowHeightM: 1.2 },
  windKn: 30,
  depthM: 6,
  tideM: 1,
  components: {
    anchor: { type: 'plow', massKg: 16 },
    chain: { grade: 'G43', tradeSizeIn: 0.3125, lengthM: 60 },
    snubber: { material: 'nylon', diameterMm: 14, lengthM: 6 },
    connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 0.375 }],
  },
};
