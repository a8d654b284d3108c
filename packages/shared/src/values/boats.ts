// Boat and tackle-plan vocabulary, without the schemas: the web app's first load reads these.
export const HULLS = ['sail', 'power', 'multihull'] as const;
export type Hull = (typeof HULLS)[number];
export const CHAIN_GRADE_IDS = ['G30', 'G43', 'G70', 'G80', 'G100'] as const;
export const ANCHOR_KINDS = ['plow', 'claw', 'fluke', 'scoop', 'grapnel', 'fisherman'] as const;
export const BOTTOMS = ['sand', 'mixed', 'mud', 'clay', 'weed', 'rock'] as const;
export const CONNECTOR_KINDS = ['shackle', 'swivel', 'link', 'splice', 'other'] as const;
export const PLAN_CONDITIONS = ['everyday', 'storm', 'hurricane-hole', 'custom'] as const;
export type PlanCondition = (typeof PLAN_CONDITIONS)[number];
