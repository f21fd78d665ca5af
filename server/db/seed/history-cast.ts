// The invented people, customers and equipment of the demo's history. Every name and make here is
// made up for Kettle Creek Mower & Saw; none is a real person, business or brand.
import type { EquipmentKind, UnitSystem } from "../../../shared/equipment.ts";
import type { Role } from "../../../shared/schemas/users.ts";

export interface TechSpec {
  email: string;
  name: string;
  role: Exclude<Role, "shop_lead">;
  unitSystem: UnitSystem;
  password: string;
  /** How much of the bench work falls to them, against 1 for a full-time tech. */
  share: number;
}

/** Three more techs beside the demo's apprentice and senior tech; their passwords are not printed at start. */
export const historyTechs: TechSpec[] = [
  { email: "priya.holm@kettlecreek.example", name: "Priya Holm", role: "apprentice", unitSystem: "imperial", password: "bench-history-priya", share: 1.1 },
  { email: "dell.marrick@kettlecreek.example", name: "Dell Marrick", role: "senior_tech", unitSystem: "imperial", password: "bench-history-dell", share: 0.8 },
  { email: "tobias.fenn@kettlecreek.example", name: "Tobias Fenn", role: "apprentice", unitSystem: "metric", password: "bench-history-tobias", share: 0.9 },
];

export const firstNames = [
  "Ada", "Alder", "Anselm", "Bettina", "Bram", "Cato", "Celia", "Corin", "Dagny", "Dov", "Edda", "Elsie", "Emrys", "Fintan", "Flora", "Gideon",
  "Greta", "Hale", "Hollis", "Ilse", "Ines", "Ivo", "Jory", "Juniper", "Kasimir", "Kit", "Lorna", "Lysander", "Mabel", "Milo", "Nell", "Niamh",
  "Oona", "Otis", "Perrin", "Pia", "Quentin", "Rhea", "Roald", "Saoirse", "Silas", "Solveig", "Tamsin", "Tova", "Ulla", "Ulric", "Vesna", "Vern",
  "Wynne", "Xanthe", "Yara", "Yusuf", "Zeb", "Zinnia", "Arlo", "Briony", "Cosmo", "Delphine", "Eben", "Fenna",
];

export const lastNames = [
  "Aldergrove", "Bellweather", "Brindlecombe", "Cindermoss", "Corrigale", "Dunmarrow", "Eddleston", "Fairhurst", "Fallowby", "Gillowmere",
  "Grenville-Sott", "Hatherley", "Hobbleton", "Inchcombe", "Jessington", "Kestell", "Kittering", "Lathom", "Larchwood", "Mossop", "Merrivane",
  "Nettleford", "Nookesby", "Orchardson", "Oddingley", "Pennyfeather", "Plumtree", "Quarrington", "Rookwood", "Rushbury", "Sallowfield",
  "Scarrow", "Tallowby", "Thistlewood", "Umberleigh", "Underhay", "Vantreight", "Wexcombe", "Whinmoor", "Yarrowby", "Zennorth", "Ashcombe",
  "Birkett", "Coldharbour", "Dimmock", "Elmsleigh", "Fernaby", "Goodwillie", "Hedgecock", "Ivesley", "Juckes", "Kirkbride", "Loxley-Dunn",
  "Mallinder", "Norwell", "Oakenshaw", "Prewitt", "Ravensworth", "Stonehouse", "Treadgold", "Upcott", "Verlander", "Wintle", "Yeabsley",
];

export interface MakeSpec {
  make: string;
  models: readonly string[];
  /** The engine's own code starts with this. */
  engine: string;
}

export interface KindSpec {
  kind: EquipmentKind;
  cycle: 2 | 4;
  makes: readonly MakeSpec[];
  cc: readonly number[];
  /** How often it comes in, and by month (January first) how busy its season is. */
  weight: number;
  season: readonly number[];
  primer: number;
  fuelValve: number;
  oilSensor: number;
  arrestor: number;
  hourMeter: number;
}

const yearRound = [1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1, 1];
const spring = [0.4, 0.5, 1.1, 1.7, 1.8, 1.5, 1.2, 1.1, 0.9, 0.7, 0.5, 0.4];
const autumn = [1.2, 1, 0.8, 0.7, 0.6, 0.6, 0.7, 0.8, 1.2, 1.5, 1.5, 1.3];

export const kinds: readonly KindSpec[] = [
  {
    kind: "string_trimmer", cycle: 2, weight: 22, season: spring, cc: [21.7, 25.4, 27.2, 30.5], primer: 0.9, fuelValve: 0, oilSensor: 0, arrestor: 0.8, hourMeter: 0,
    makes: [{ make: "Copperbeck", models: ["CT-226", "CT-240", "CT-252X"], engine: "CB" }, { make: "Tanwick", models: ["TW 25S", "TW 31"], engine: "TK" }, { make: "Wrenfield", models: ["WT-27"], engine: "WF" }],
  },
  {
    kind: "string_trimmer", cycle: 4, weight: 5, season: spring, cc: [25, 31], primer: 0.9, fuelValve: 0, oilSensor: 0, arrestor: 0.7, hourMeter: 0,
    makes: [{ make: "Quillmark", models: ["QT4-25", "QT4-31"], engine: "QM" }, { make: "Copperbeck", models: ["CT-4S 25"], engine: "CB" }],
  },
  {
    kind: "chainsaw", cycle: 2, weight: 13, season: autumn, cc: [35.2, 40.1, 45.6, 50.2, 55.5], primer: 0.6, fuelValve: 0, oilSensor: 0, arrestor: 0.9, hourMeter: 0,
    makes: [{ make: "Wrenfield", models: ["WS 38", "WS 45", "WS 52 Pro"], engine: "WF" }, { make: "Tanwick", models: ["TC-40"], engine: "TK" }, { make: "Copperbeck", models: ["CS-351"], engine: "CB" }],
  },
  {
    kind: "leaf_blower", cycle: 2, weight: 8, season: autumn, cc: [25.4, 50.8, 63.3], primer: 0.9, fuelValve: 0, oilSensor: 0, arrestor: 0.7, hourMeter: 0,
    makes: [{ make: "Copperbeck", models: ["CB-26H"], engine: "CB" }, { make: "Tanwick", models: ["TB 50 Pack", "TB 63 Pack"], engine: "TK" }],
  },
  {
    kind: "leaf_blower", cycle: 4, weight: 3, season: autumn, cc: [25, 31], primer: 0.9, fuelValve: 0, oilSensor: 0, arrestor: 0.6, hourMeter: 0,
    makes: [{ make: "Quillmark", models: ["QB4-25", "QB4-31 Pack"], engine: "QM" }],
  },
  {
    kind: "hedge_trimmer", cycle: 2, weight: 5, season: spring, cc: [21.7, 23.6], primer: 0.9, fuelValve: 0, oilSensor: 0, arrestor: 0.7, hourMeter: 0,
    makes: [{ make: "Fellbrook", models: ["FH-22", "FH-24D"], engine: "FB" }, { make: "Tanwick", models: ["TH 23"], engine: "TK" }],
  },
  {
    kind: "walk_behind_mower", cycle: 4, weight: 28, season: spring, cc: [140, 163, 173, 190], primer: 0.5, fuelValve: 0.15, oilSensor: 0.1, arrestor: 0.05, hourMeter: 0,
    makes: [
      { make: "Harrow & Vale", models: ["HV 21 Push", "HV 21SP", "HV 22 Mulch"], engine: "HV" },
      { make: "Marrowby", models: ["M-53", "M-56 Drive"], engine: "MB" },
      { make: "Loamfield", models: ["LF 460", "LF 510 SP"], engine: "LF" },
    ],
  },
  {
    kind: "generator", cycle: 4, weight: 16, season: autumn.map((w, i) => (w + yearRound[i]!) / 2), cc: [79, 149, 212, 302, 420], primer: 0, fuelValve: 1, oilSensor: 0.9, arrestor: 0.6, hourMeter: 0.5,
    makes: [{ make: "Stonemoor", models: ["SG 2200i", "SG 3500"], engine: "SM" }, { make: "Emberline", models: ["EL 4000", "EL 7500E"], engine: "EM" }, { make: "Voltmere", models: ["VM-2000", "VM-3200i"], engine: "VM" }],
  },
];

/** What customers say at the counter, by the area of the fault that turns out to be behind it, and what is said of anything. */
export const complaints = {
  any: ["Will not start.", "Pulls over but never catches.", "Ran fine last season, now nothing.", "Won't start, not even a cough.", "Stopped on me and won't go again."],
  fuel: ["Sat in the shed all winter and won't start.", "Starts for a second then dies.", "Smells of fuel but won't fire.", "Only runs with the choke on, then quits."],
  spark: ["Turns over fine, nothing happens.", "Died all at once and won't restart.", "Won't start since it got wet."],
  air: ["Smokes, then won't start.", "Runs rough and now won't start at all.", "Lost power over the summer, now no start."],
  compression: ["Pulls over far too easily.", "Hard to pull one day, now no start.", "Was losing power for months, now won't start."],
} as const;

export const alreadyTried = ["", "", "", "New fuel from the station.", "Changed the spark plug.", "Cleaned the air filter.", "Used a starting spray.", "Primed it a lot.", "Let it sit and tried again."];

export const benchNotes = [
  "Customer says it sat since last autumn.",
  "Recoil rope is frayed; put it on the estimate.",
  "Plug was only finger-tight.",
  "Fuel in the tank smelled of varnish.",
  "Retested to be sure; same result.",
  "Used the short gauge hose adapter.",
  "Rodent nest under the shroud, cleared before running.",
  "Throttle cable is stiff; worth a look while it is in.",
  "Air filter housing clip is broken.",
  "Customer wants the old parts back.",
];

export const approvalComments = ["", "", "", "", "", "Clear readings, good photos.", "Good write-up.", "Agree with the finding."];

export const returnComments = [
  "The compression reading does not match the photo of the gauge. Test it again and record what the gauge shows.",
  "Several steps were answered faster than they can be done. Go through the fuel checks again and take your time.",
  "Before we quote a carburettor, confirm the fuel filter and lines with a photo.",
  "The finding does not fit what the customer described. Reproduce the fault first and note what you saw.",
  "Add a note on the plug's condition and redo the spark check with the gap tester.",
];

export const abandonReasons = [
  "Started the wrong check for this unit.",
  "Customer collected the unit before the check was done.",
  "Started on the wrong work order.",
  "Had to stop for a rush job; starting again later.",
];
