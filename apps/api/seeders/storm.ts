import { DEFAULT_STORM_CHECKLIST, type PlanComponents, type StormLocation } from '@app/shared';
import { Boat, StormReadiness, StormWatch, TacklePlan } from '../src/models';
import type { AreaSeeder } from './seed-context';

const DAY_MS = 86_400_000;

interface StormPlanRow {
  boat: string;
  name: string;
  depthM: number;
  tideM: number;
  components: PlanComponents;
}
const stormPlan = (
  boat: string,
  name: string,
  depthM: number,
  tideM: number,
  components: PlanComponents,
): StormPlanRow => ({ boat, name, depthM, tideM, components });

// Invented gear for the demo boats' storm plans (figures are demo data, checked by the app like any plan).
// Each row: boat, plan name, depth (m), tide range (m), gear.
const PLANS: StormPlanRow[] = [
  stormPlan('Marram', 'Storm at the Brindle anchorage', 5, 1.5, {
    anchor: { type: 'plow', massKg: 20 },
    chain: { grade: 'G43', tradeSizeIn: 0.3125, lengthM: 60 },
    snubber: { material: 'nylon', diameterMm: 14, lengthM: 8 },
    connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 0.375 }],
  }),
  stormPlan('Slow Tern', 'Hurricane hole', 4, 1, {
    anchor: { type: 'claw', massKg: 30 },
    chain: { grade: 'G70', tradeSizeIn: 0.375, lengthM: 70 },
    snubber: { material: 'nylon', diameterMm: 18, lengthM: 10 },
    connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 0.5 }],
  }),
  stormPlan('Greywake', 'Everyday', 4, 1, {
    anchor: { type: 'fluke', massKg: 8 },
    chain: { grade: 'G30', tradeSizeIn: 0.25, lengthM: 10 },
    rode: { material: 'nylon', construction: 'three-strand', diameterMm: 12, lengthM: 40 },
    connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 0.25 }],
  }),
];

const allIds = DEFAULT_STORM_CHECKLIST.map((i) => i.id);

/** One boat's readiness row for a watch, as the demo seeds it. */
const readiness = (
  watch: StormWatch,
  boat: string,
  location: StormLocation,
  plan: boolean,
  ticked: readonly string[],
  help: boolean,
) => ({ watch, boat, location, plan, ticked, help });

/** Storm plans for three demo boats, one closed past watch with its lessons and one open watch. */
export const seedStorm: AreaSeeder = async ({ transaction, users, harbors, now }) => {
  const boats = new Map((await Boat.findAll({ transaction })).map((b) => [b.name, b]));
  const plans = new Map<string, TacklePlan>();
  for (const p of PLANS) {
    const boat = boats.get(p.boat);
    if (!boat) continue;
    plans.set(
      p.boat,
      await TacklePlan.create(
        {
          boatId: boat.id,
          ownerId: boat.ownerId,
          name: p.name,
          condition: p.name === 'Everyday' ? 'everyday' : 'storm',
          windKn: p.name === 'Everyday' ? 30 : 50,
          depthM: p.depthM,
          tideM: p.tideM,
          bottom: 'mud',
          components: p.components,
          notes: '',
        },
        { transaction },
      ),
    );
  }
  const moderator = users.get('moderator@larkspit.example');
  const harbourIds = harbors.map((h) => h.id);
  const at = (days: number) => new Date(now.getTime() + days * DAY_MS);

  const past = await StormWatch.create(
    {
      name: 'Autumn low Marrowick',
      sustainedKn: 45,
      gustKn: 60,
      surgeM: 0.5,
      arrivesAt: at(-64),
      endsAt: at(-63),
      harborIds: harbourIds.slice(0, 2),
      note: 'Club moorings checked last month. Dinghies ashore by Friday noon.',
      shareDetails: false,
      checklist: DEFAULT_STORM_CHECKLIST,
      status: 'closed',
      openedById: moderator?.id ?? null,
      closedById: moderator?.id ?? null,
      closedAt: at(-61),
      lessons:
        'Every boat on a doubled snubber rode it out. One single snubber chafed through at a fairlead without chafe gear.\n\nStart the checklist two days earlier: the last dinghies went ashore in 35 kn.',
      lessonsPostId: null,
    },
    { transaction },
  );
  const open = await StormWatch.create(
    {
      name: 'Tropical storm Quillmere',
      sustainedKn: 50,
      gustKn: 65,
      surgeM: 0.6,
      arrivesAt: at(2),
      endsAt: at(3),
      harborIds: harbourIds,
      note: 'The harbour office asks every boat on the outer moorings to double its pendants.',
      shareDetails: false,
      checklist: DEFAULT_STORM_CHECKLIST,
      status: 'open',
      openedById: moderator?.id ?? null,
      closedById: null,
      closedAt: null,
      lessons: null,
      lessonsPostId: null,
    },
    { transaction },
  );

  const idris = users.get('idris@larkspit.example');
  // Each row: watch, boat, where it rides the storm, storm plan linked, checklist items ticked, help wanted.
  const rows = [
    readiness(past, 'Marram', 'own-anchor', true, allIds, false),
    readiness(past, 'Slow Tern', 'marina-berth', false, allIds, false),
    readiness(open, 'Marram', 'own-anchor', true, allIds.slice(0, 3), false),
    readiness(open, 'Slow Tern', 'marina-berth', false, allIds, false),
    readiness(open, 'Two Gulls', 'club-mooring', false, allIds.slice(0, 2), true),
  ];
  for (const r of rows) {
    const boat = boats.get(r.boat);
    if (!boat) continue;
    await StormReadiness.create(
      {
        watchId: r.watch.id,
        boatId: boat.id,
        location: r.location,
        planId: r.plan ? (plans.get(r.boat)?.id ?? null) : null,
        depthM: null,
        ticked: [...r.ticked],
        helpWanted: r.help,
        helpNote: r.help ? 'Need a hand stripping the trampoline and headsail' : '',
        buddyUserId: r.boat === 'Two Gulls' && r.watch === open ? (idris?.id ?? null) : null,
        filledAt: r.watch === open ? at(-0.2) : at(-65),
      },
      { transaction },
    );
  }
};
