/**
 * Stickerline's safety cautions, in one place so every screen says the same thing. Plain words;
 * each one defers to local rules and licensed practice, because conditions and codes differ.
 * Wood dust: IARC Monograph vol. 62 (Group 1); NIOSH REL 1 mg/m³. Lifting: NIOSH Pub. 94-110.
 * The rest is common practice.
 */
export type SafetyCaution = { id: string; title: string; text: string };

const DEFER = 'Follow your local rules and codes and licensed practice; when in doubt ask a qualified person.';

export const FINISHING_CAUTION: SafetyCaution = {
  id: 'finishing',
  title: 'Filling and finishing',
  text:
    'Epoxy fill, oil finishes, stains and solvents give off fumes and can irritate skin: work with plenty of fresh air, ' +
    'and follow each product’s label, including the gloves and respirator it calls for. Rags soaked in oil finishes can heat up ' +
    'and catch fire on their own: lay them flat to dry outdoors or keep them in a closed metal can filled with water, and ' +
    `dispose of them as your local fire rules say. ${DEFER}`,
};

export const EQUIPMENT_CAUTION: SafetyCaution = {
  id: 'equipment',
  title: 'Forklifts and hoists',
  text:
    'Forklifts, hoists and slab lifters are run by trained operators only (certified where your local rules require it). ' +
    'Keep everyone clear of a raised or moving load, never stand under it, and use straps and lifting points rated for the weight. ' +
    DEFER,
};

export const STAFF_DUST_NOISE_CAUTION: SafetyCaution = {
  id: 'staff-dust-noise',
  title: 'Flattening and sanding at the mill: dust and noise',
  text:
    'Router sleds, planers and sanders make fine wood dust, which is classed as causing cancer in people (IARC Monograph vol. 62; ' +
    'NIOSH exposure limit 1 mg/m³), and noise loud enough to damage hearing. Run dust collection at the tool, wear a fitted ' +
    'respirator and hearing and eye protection, keep guards in place, and clean up with a vacuum rather than compressed air. ' +
    `${DEFER}`,
};

export const MOVE_TO_STACK_CAUTION: SafetyCaution = {
  id: 'move-to-stack',
  title: 'Moving slabs between stacks',
  text:
    'Most slabs weigh far more than one person should lift from the ground (the NIOSH lifting equation gives about 15 lb for a ' +
    'wide slab lifted from the floor with a poor grip, NIOSH Pub. 94-110). Move them on a slab cart or with the forklift or hoist ' +
    '(trained operators only), keep hands and feet clear of stacks and stickers, and build stacks level and stable. ' + DEFER,
};

export const SAWING_CAUTION: SafetyCaution = {
  id: 'sawing',
  title: 'Sawing safely',
  text:
    'Only trained people run the saw mill or chainsaw mill. A chainsaw can kick back when the tip of the bar catches: keep both ' +
    'hands on the saw and stand out of the line of the bar. Keep bystanders well clear, chock the log so it cannot roll, wear eye, ' +
    'ear and leg protection and chainsaw boots and gloves, and follow the saw maker’s instructions. ' + DEFER,
};

export const SAFETY_CAUTIONS = [FINISHING_CAUTION, EQUIPMENT_CAUTION, STAFF_DUST_NOISE_CAUTION, MOVE_TO_STACK_CAUTION, SAWING_CAUTION] as const;
