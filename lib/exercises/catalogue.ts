/**
 * Built-in exercise catalogue: one entry per movement, with the names coaches commonly
 * write for it and the kind of equipment that decides how its load is rounded.
 *
 * @example
 * CATALOGUE.find((e) => e.id === "back-squat")?.aliases; // ["squat", ...]
 */

/** How a movement is loaded; decides the rounding rule for its loads. */
export type EquipmentKind = "barbell" | "dumbbell" | "cable" | "machine" | "bodyweight" | "other";

export interface CatalogueEntry {
  /** Stable kebab-case key. */
  id: string;
  /** Display name, lower case as coaches write it. */
  name: string;
  /** Other spellings that mean the same movement (and share one 1RM). */
  aliases: readonly string[];
  equipment: EquipmentKind;
}

const e = (id: string, name: string, equipment: EquipmentKind, aliases: string[] = []): CatalogueEntry => ({ id, name, equipment, aliases });

export const CATALOGUE: readonly CatalogueEntry[] = [
  // Barbell
  e("back-squat", "back squat", "barbell", ["squat", "barbell squat", "high bar squat", "low bar squat"]),
  e("front-squat", "front squat", "barbell"),
  e("paused-squat", "paused squat", "barbell", ["pause squat"]),
  e("bench-press", "bench press", "barbell", ["bench", "barbell bench press", "flat bench press"]),
  e("incline-bench-press", "incline bench press", "barbell", ["incline press", "incline bench"]),
  e("close-grip-bench-press", "close grip bench press", "barbell", ["close-grip bench", "cgbp"]),
  e("overhead-press", "overhead press", "barbell", ["ohp", "press", "military press", "standing press"]),
  e("push-press", "push press", "barbell"),
  e("deadlift", "deadlift", "barbell", ["conventional deadlift", "dl"]),
  e("sumo-deadlift", "sumo deadlift", "barbell"),
  e("romanian-deadlift", "romanian deadlift", "barbell", ["rdl"]),
  e("stiff-leg-deadlift", "stiff leg deadlift", "barbell", ["sldl"]),
  e("barbell-row", "barbell row", "barbell", ["bent over row", "bent-over row", "pendlay row"]),
  e("hip-thrust", "hip thrust", "barbell", ["barbell hip thrust"]),
  e("good-morning", "good morning", "barbell"),
  e("power-clean", "power clean", "barbell", ["clean"]),
  e("barbell-curl", "barbell curl", "barbell"),
  // Dumbbell
  e("dumbbell-bench-press", "dumbbell bench press", "dumbbell", ["db bench press", "dumbbell press"]),
  e("incline-dumbbell-press", "incline dumbbell press", "dumbbell", ["incline db press"]),
  e("seated-dumbbell-press", "seated dumbbell press", "dumbbell", ["seated db press", "dumbbell shoulder press"]),
  e("dumbbell-row", "dumbbell row", "dumbbell", ["db row", "one arm dumbbell row"]),
  e("lateral-raise", "lateral raise", "dumbbell", ["dumbbell lateral raise", "side raise"]),
  e("dumbbell-curl", "dumbbell curl", "dumbbell", ["db curl"]),
  e("hammer-curl", "hammer curl", "dumbbell"),
  e("goblet-squat", "goblet squat", "dumbbell"),
  e("bulgarian-split-squat", "bulgarian split squat", "dumbbell", ["split squat", "rear foot elevated split squat"]),
  e("dumbbell-romanian-deadlift", "dumbbell romanian deadlift", "dumbbell", ["db rdl"]),
  e("walking-lunge", "walking lunge", "dumbbell", ["lunge"]),
  e("incline-curl", "incline curl", "dumbbell", ["incline dumbbell curl"]),
  e("rear-delt-fly", "rear delt fly", "dumbbell", ["reverse fly"]),
  // Cable
  e("cable-row", "cable row", "cable", ["seated cable row"]),
  e("lat-pulldown", "lat pulldown", "cable", ["pulldown", "lat pull-down"]),
  e("face-pull", "face pull", "cable"),
  e("triceps-pushdown", "triceps pushdown", "cable", ["tricep pushdown", "pushdown", "rope pushdown"]),
  e("cable-fly", "cable fly", "cable", ["cable crossover"]),
  e("low-to-high-cable-fly", "low-to-high cable fly", "cable"),
  e("cable-curl", "cable curl", "cable"),
  e("overhead-triceps-extension", "overhead triceps extension", "cable", ["overhead tricep extension"]),
  // Machine
  e("machine-row", "machine row", "machine", ["chest supported row"]),
  e("leg-press", "leg press", "machine"),
  e("leg-extension", "leg extension", "machine"),
  e("leg-curl", "leg curl", "machine", ["lying leg curl", "seated leg curl", "hamstring curl"]),
  e("machine-chest-press", "machine chest press", "machine", ["chest press"]),
  e("calf-raise", "calf raise", "machine", ["standing calf raise"]),
  e("hack-squat", "hack squat", "machine"),
  e("seated-calf-raise", "seated calf raise", "machine"),
  e("machine-shoulder-press", "machine shoulder press", "machine", ["shoulder press machine"]),
  // Bodyweight
  e("pull-up", "pull-up", "bodyweight", ["pullup", "pull up"]),
  e("chin-up", "chin-up", "bodyweight", ["chinup", "chin up"]),
  e("dip", "dip", "bodyweight", ["dips", "parallel bar dip"]),
  e("push-up", "push-up", "bodyweight", ["pushup", "push up"]),
  e("inverted-row", "inverted row", "bodyweight"),
  e("plank", "plank", "bodyweight"),
  e("side-plank", "side plank", "bodyweight"),
  e("assisted-pull-up", "assisted pull-up", "bodyweight", ["band-assisted pull-up", "band assisted pullup"]),
  e("assisted-chin-up", "assisted chin-up", "bodyweight", ["band-assisted chin-up"]),
  e("hanging-leg-raise", "hanging leg raise", "bodyweight"),
  e("back-extension", "back extension", "bodyweight", ["hyperextension", "45-degree back extension", "45 degree hyperextension"]),
  // Other
  e("farmers-walk", "farmer's walk", "other", ["farmers walk", "farmer walk", "farmer carry"]),
  e("sled-push", "sled push", "other"),
  e("kettlebell-swing", "kettlebell swing", "other", ["kb swing"]),
  e("preacher-curl", "preacher curl", "other", ["ez bar preacher curl"]),
];
