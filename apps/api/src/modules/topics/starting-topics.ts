// Shared by the migration that creates the topics table and by the demo seeder (which runs after tests have
// emptied the table), so neither imports the other.

/** The topics a club starts with; admins edit the list afterwards. */
export const STARTING_TOPICS = [
  ['anchoring', 'Anchoring', 'Setting, holding and weighing anchor; choosing an anchor type.'],
  ['rode-and-chain', 'Rode and chain', 'Chain grades and sizes, rope rodes, splices and scope.'],
  [
    'snubbers-and-bridles',
    'Snubbers and bridles',
    'Taking the shock load off the windlass and bow.',
  ],
  ['storm-preparation', 'Storm preparation', 'Getting boat and ground tackle ready for a blow.'],
  ['rigging-and-splicing', 'Rigging and splicing', 'Shackles, swivels, eye splices and seizing.'],
  ['maintenance', 'Maintenance', 'Inspecting, regalvanising and replacing worn gear.'],
  ['passage-planning', 'Passage planning', 'Anchorages, weather windows and tides on the way.'],
] as const;
