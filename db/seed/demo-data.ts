// The demo scenario, generated in memory from a fixed seed: an invented guild, town, show, people
// and quilts. Pure data (no database imports) so tests, the seeder and the start script share it.
// Everything here is made up: no real people, places, shows, fabric lines or pattern designers.
import { formatInches, UM_PER_INCH } from "../../scoring/units";

export const DEMO_PASSWORD = "quilt-show-demo";
export const DEMO_EMAIL_DOMAIN = "ribbonry.test"; // .test is reserved (RFC 2606): never delivered.
const SCENARIO_SEED = 20261202;

export type DemoRole = "admin" | "chair" | "judge" | "scribe" | "intake" | "entrant";
export type DemoShowRole = Exclude<DemoRole, "admin" | "entrant">;
// The same literals as the enums in db/schema/entries.ts; seed-demo.ts checks them at compile time.
export type DemoQuiltingMethod = "hand" | "home_machine" | "frame_machine";
export type DemoDivision = "open" | "youth" | "first_time";
export type DemoEntryStatus = "draft" | "submitted" | "paid";

export interface DemoAccount {
  role: DemoRole;
  name: string;
  email: string;
}

export interface DemoProfile {
  displayName: string;
  phone: string;
  addressLine1: string;
  addressLine2: string;
  city: string;
  region: string;
  postalCode: string;
  country: string;
  guild: string;
  publishNameConsent: boolean;
}

export interface DemoPerson extends DemoAccount {
  /** When the account was made (ISO, UTC). */
  joinedAt: string;
  /** Entrants only. */
  profile: DemoProfile | null;
  /** Entrants only: the division all their quilts are entered in. */
  division: DemoDivision | null;
}

export interface DemoQuilt {
  /** Stable key within the scenario ("q001" …), handy for photo seeds and tests. */
  key: string;
  entrantEmail: string;
  entryNumber: number | null;
  title: string;
  widthIn: number;
  lengthIn: number;
  widthUm: number;
  lengthUm: number;
  /** e.g. "60½ × 72¼ in" (width × length). */
  sizeLabel: string;
  techniques: string[];
  madeBy: string[];
  quiltedBy: string;
  quiltedForHire: boolean;
  quiltingMethod: DemoQuiltingMethod;
  patternSource: string;
  statement: string;
  declaredValueCents: number;
  judged: boolean;
  division: DemoDivision;
  status: DemoEntryStatus;
  /** Seed for the generated photos of this quilt. */
  photoSeed: number;
  createdAt: string;
  updatedAt: string;
}

export interface DemoShow {
  slug: string;
  name: string;
  guildName: string;
  venueName: string;
  venueAddress: string;
  timeZone: string;
  status: "entries_open";
  entryOpensAt: string;
  entryClosesAt: string;
  dropOffStartsAt: string;
  dropOffEndsAt: string;
  judgingStartsAt: string;
  judgingEndsAt: string;
  showOpensAt: string;
  showClosesAt: string;
  pickUpStartsAt: string;
  pickUpEndsAt: string;
}

export interface DemoScenario {
  town: string;
  show: DemoShow;
  people: DemoPerson[];
  quilts: DemoQuilt[];
}

export const DEMO_TECHNIQUES = [
  "pieced",
  "appliqué",
  "mixed",
  "art",
  "modern",
  "wholecloth",
  "paper piecing",
  "English paper piecing",
  "embroidery",
] as const;

const TOWN = "Pennywhistle Falls";
const REGION = "IL";
// ZIP codes below 00501 are not assigned, so this one can never be someone's real address.
const POSTAL_CODE = "00155";
const HOME_GUILD = "Pennywhistle Falls Quilters' Guild";

// Wall-clock times in America/Chicago. Daylight saving starts 14 March 2027, so every date from
// November to 7 March is on CST (UTC−6); the offsets below are therefore all −06:00.
export const DEMO_SHOW: DemoShow = {
  slug: "pennywhistle-falls-quilt-show-2027",
  name: "Pennywhistle Falls Quilt Show 2027",
  guildName: HOME_GUILD,
  venueName: "Millrace Hall, Pennywhistle Falls Fairgrounds",
  venueAddress: `400 Fairground Road, ${TOWN}, ${REGION} ${POSTAL_CODE}`,
  timeZone: "America/Chicago",
  status: "entries_open",
  entryOpensAt: iso("2026-11-15T09:00:00-06:00"),
  entryClosesAt: iso("2027-01-31T23:59:00-06:00"),
  dropOffStartsAt: iso("2027-03-01T10:00:00-06:00"),
  dropOffEndsAt: iso("2027-03-02T18:00:00-06:00"),
  judgingStartsAt: iso("2027-03-03T08:30:00-06:00"),
  judgingEndsAt: iso("2027-03-04T17:00:00-06:00"),
  showOpensAt: iso("2027-03-05T09:00:00-06:00"),
  showClosesAt: iso("2027-03-07T16:00:00-06:00"),
  pickUpStartsAt: iso("2027-03-07T16:30:00-06:00"),
  pickUpEndsAt: iso("2027-03-07T18:30:00-06:00"),
};

function iso(local: string): string {
  return new Date(local).toISOString();
}

/** mulberry32: tiny, fast and seedable, so the scenario is the same on every run. */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const STAFF: { role: Exclude<DemoRole, "entrant">; name: string; email: string }[] = [
  { role: "admin", name: "Maren Ashgrove", email: "admin@ribbonry.test" },
  { role: "chair", name: "Delia Fenmore", email: "chair@ribbonry.test" },
  { role: "judge", name: "Harriet Quenby", email: "judge1@ribbonry.test" },
  { role: "judge", name: "Odile Marchbank", email: "judge2@ribbonry.test" },
  { role: "judge", name: "Winifred Tollesby", email: "judge3@ribbonry.test" },
  { role: "scribe", name: "Posy Caddwell", email: "scribe1@ribbonry.test" },
  { role: "scribe", name: "June Elderkin", email: "scribe2@ribbonry.test" },
  { role: "intake", name: "Bram Hollinbrook", email: "intake@ribbonry.test" },
];

const FIRST_NAMES = [
  "Agnes", "Beatrix", "Cora", "Dorothea", "Edith", "Flora", "Greta", "Hazel", "Ida", "Josephine",
  "Katrin", "Lorna", "Mabel", "Nell", "Opal", "Prudence", "Rosalind", "Sylvie", "Tamsin", "Ursula",
  "Vera", "Wilma", "Yvette", "Zelda", "Amos", "Calvin", "Elias", "Gideon", "Leland", "Silas",
  "Noor", "Priya", "Mei", "Lucía", "Amara", "Ingrid", "Teodora", "Keiko", "Fern", "Marisol",
  "Ottilie", "Birdie", "Clementine", "Ramona", "Dagny", "Esme", "Hollis", "Juniper",
];

const SURNAMES = [
  "Amberley", "Bellweather", "Birchell", "Brindlemoor", "Copperidge", "Cinderby", "Corraway",
  "Daleholm", "Dunsmore", "Eastwold", "Fallowmere", "Foxley", "Gorsebrook", "Ivensby", "Kettlewick",
  "Larkhollow", "Marrowfield", "Nettlefold", "Oakhurst", "Pellingham", "Rushmere", "Sedgecombe",
  "Thistlecombe", "Underhay", "Vellacott", "Wadebrook", "Yarrowby", "Millbeck", "Hartsfell",
  "Quillon", "Tansley", "Brackwell",
];

const STREETS = [
  "Bobbin Lane", "Selvage Street", "Thimble Row", "Batting Avenue", "Feedsack Road", "Spindle Court",
  "Mill Pond Road", "Orchard Way", "Lantern Street", "Chicory Drive", "Heron Bend", "Cider Mill Road",
];

const OTHER_GUILDS = ["Tansy Creek Stitchers", "Osier Glen Modern Quilt Circle", "Second Tuesday Bee"];

const LONGARM_STUDIOS = ["Millrace Longarm Studio", "Two Spools Quilting Service", "Hollow Reed Longarm"];

const PATTERNS = [
  "Prairie Lantern", "Porch Swing Star", "Chicory Path", "Millpond Ripple", "Barn Owl Medallion",
  "Cider Press Sampler", "Windowpane Garden", "Kite Day", "Lantern Row", "Honeycomb Lane",
];
const DESIGNERS = [
  "Odessa Wickham Designs", "Thimble & Thorn Patterns", "Little Fennel Studio", "Brindle Owl Patterns",
  "Mossgate Quilt Studio", "Hattie Pellingham",
];

const TITLE_ADJECTIVES = [
  "Amber", "Midnight", "Scattered", "Crooked", "Bramble", "Kitchen", "Harvest", "Rainy", "Borrowed",
  "Salt", "Winter", "Clover", "Cedar", "Tangled", "Quiet", "Wild", "Sunday", "Paper", "Copper",
  "Indigo", "Plum", "Little", "Lost", "Morning", "Stormy", "Gingham", "Humble", "Lucky",
];
const TITLE_NOUNS = [
  "Garden", "Lanterns", "Crossing", "Stars", "Geese", "Orchard", "Path", "Windows", "Ribbons",
  "Porch", "Meadow", "Kites", "Harbour", "Compass", "Nest", "Hollow", "Steps", "Baskets", "Churn",
  "Fences", "Bridges", "Lilies", "Pinwheels", "Teacups", "Foxes", "Hexagons", "Chickens", "Tides",
];
const SEASONS = ["Spring", "June", "Autumn", "Winter", "August", "October"];

const STATEMENT_OPENERS = [
  "I started this quilt during a long winter and finished it the week entries opened.",
  "This began as a pile of scraps from my sewing room floor.",
  "I wanted to see how far a few simple blocks could go.",
  "This quilt was made for my sister, who has been waiting for it for three years.",
  "The colours came from the view across the mill pond on a foggy morning.",
  "I drafted the design on graph paper at the kitchen table.",
  "My guild's block swap gave me the first dozen blocks.",
  "I learned this technique at a Tuesday workshop and could not stop.",
  "The fabrics are shirts and dresses from three generations of my family.",
];
// A middle sentence that fits the quilt's main technique (or none).
const STATEMENT_MIDDLES: Record<string, string[]> = {
  pieced: ["Every seam was pressed open to keep the points flat.", "Some blocks are deliberately wonky."],
  appliqué: ["The appliqué shapes are cut freehand, without templates.", "Every leaf is needle-turned by hand."],
  mixed: ["It mixes piecing, appliqué and a little hand embroidery."],
  art: ["I painted some of the fabric myself before cutting it up."],
  modern: ["I left a lot of negative space on purpose.", "I changed the border four times before it felt right."],
  wholecloth: ["The whole design is in the quilting; there is not a single seam in the top."],
  "paper piecing": ["Each of the sharp points is foundation pieced on paper."],
  "English paper piecing": ["Every hexagon was basted over paper and whipstitched by hand, mostly at soccer practice."],
  embroidery: ["The embroidery took longer than the rest of the quilt put together."],
};
const FIRST_TIME_OPENER = "This is the first quilt I have ever entered in a show.";
const YOUTH_OPENER = "I made this in our library's after-school sewing club.";
const STATEMENT_CLOSERS = [
  "It now lives on the back of our sofa.",
  "I hope it makes you smile.",
  "It will go to my granddaughter when she leaves for college.",
  "I am still not sure I like the green.",
  "",
];

type SizeClass = "mini" | "wall" | "lap" | "bed";

/** Inches in eighths, with the fractions quilters write (mostly whole, ½, ¼ and ¾; some eighths). */
function inches(rand: () => number, min: number, max: number): number {
  const whole = min + Math.floor(rand() * (max - min));
  const r = rand();
  const eighths = r < 0.45 ? 0 : r < 0.7 ? 4 : r < 0.8 ? 2 : r < 0.9 ? 6 : [1, 3, 5, 7][Math.floor(rand() * 4)]!;
  return whole + eighths / 8;
}

function sizeFor(rand: () => number, cls: SizeClass): [number, number] {
  switch (cls) {
    case "mini":
      return [inches(rand, 12, 24), inches(rand, 12, 24)];
    case "wall":
      return [inches(rand, 30, 60), inches(rand, 30, 60)];
    case "lap":
      return [inches(rand, 48, 66), inches(rand, 56, 80)];
    case "bed":
      return [inches(rand, 70, 108), inches(rand, 80, 110)];
  }
}

function weighted<T>(rand: () => number, options: [T, number][]): T {
  const total = options.reduce((s, [, w]) => s + w, 0);
  let r = rand() * total;
  for (const [value, w] of options) {
    r -= w;
    if (r < 0) return value;
  }
  return options[options.length - 1]![0];
}

/** Builds the scenario from the fixed seed; the same every time. Most callers want demoScenario(). */
export function buildDemoScenario(): DemoScenario {
  const rand = mulberry32(SCENARIO_SEED);
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(rand() * xs.length)]!;
  const between = (lo: number, hi: number) => lo + Math.floor(rand() * (hi - lo + 1));

  const usedNames = new Set(STAFF.map((s) => s.name));
  const inventName = () => {
    for (;;) {
      const name = `${pick(FIRST_NAMES)} ${pick(SURNAMES)}`;
      if (!usedNames.has(name)) {
        usedNames.add(name);
        return name;
      }
    }
  };

  const staffJoined = Date.parse("2026-09-14T15:00:00Z");
  const people: DemoPerson[] = STAFF.map((s, i) => ({
    ...s,
    joinedAt: new Date(staffJoined + i * 86_400_000).toISOString(),
    profile: null,
    division: null,
  }));

  // 40 entrants: three youth, six first-time entrants, the rest open (entrant1 is open).
  const divisions: DemoDivision[] = Array.from({ length: 40 }, (_, i) => (i === 0 ? "open" : i >= 37 ? "youth" : i >= 31 ? "first_time" : "open"));
  const entrantsOpenAt = Date.parse(DEMO_SHOW.entryOpensAt);
  const entrants: DemoPerson[] = divisions.map((division, i) => {
    const name = inventName();
    const n = i + 1;
    const guildRoll = rand();
    const guild = division === "youth" ? "" : guildRoll < 0.7 ? HOME_GUILD : guildRoll < 0.9 ? pick(OTHER_GUILDS) : "";
    return {
      role: "entrant",
      name,
      email: `entrant${n}@${DEMO_EMAIL_DOMAIN}`,
      joinedAt: new Date(entrantsOpenAt - between(2, 400) * 86_400_000).toISOString(),
      division,
      profile: {
        displayName: name,
        // 555-0100 … 555-0199 is set aside for fiction (North American Numbering Plan).
        phone: `(217) 555-01${String(10 + i * 2)}`,
        addressLine1: `${between(10, 980)} ${pick(STREETS)}`,
        addressLine2: rand() < 0.15 ? `Apt ${between(1, 4)}${pick(["A", "B", "C"])}` : "",
        city: TOWN,
        region: REGION,
        postalCode: POSTAL_CODE,
        country: "US",
        guild,
        publishNameConsent: division === "youth" ? rand() < 0.4 : rand() < 0.75,
      },
    };
  });
  people.push(...entrants);

  // 120 quilts: everyone enters one, entrant1 three, the remaining 78 spread with at most 5 each.
  const counts = entrants.map((_, i) => (i === 0 ? 3 : 1));
  let remaining = 120 - counts.reduce((a, b) => a + b, 0);
  while (remaining > 0) {
    const i = Math.floor(rand() * entrants.length);
    if (counts[i]! < 5) {
      counts[i]!++;
      remaining--;
    }
  }

  const usedTitles = new Set<string>();
  const inventTitle = () => {
    for (;;) {
      const form = rand();
      const title =
        form < 0.45
          ? `${pick(TITLE_ADJECTIVES)} ${pick(TITLE_NOUNS)}`
          : form < 0.65
            ? `${pick(TITLE_NOUNS)} in ${pick(SEASONS)}`
            : form < 0.8
              ? `${TOWN.split(" ")[0]} ${pick(TITLE_NOUNS)}`
              : form < 0.9
                ? `${pick(TITLE_NOUNS)} for ${pick(FIRST_NAMES)}`
                : `${pick(TITLE_ADJECTIVES)} ${pick(TITLE_NOUNS)} No. ${between(2, 9)}`;
      if (!usedTitles.has(title)) {
        usedTitles.add(title);
        return title;
      }
    }
  };

  const quilts: DemoQuilt[] = [];
  const now = Date.parse("2026-12-01T23:00:00Z");
  let q = 0;
  entrants.forEach((entrant, i) => {
    for (let k = 0; k < counts[i]!; k++) {
      q++;
      const youth = entrant.division === "youth";
      const cls: SizeClass = youth
        ? weighted(rand, [["mini", 2], ["wall", 3], ["lap", 2]])
        : weighted(rand, [["mini", 15], ["wall", 35], ["lap", 25], ["bed", 25]]);
      const [widthIn, lengthIn] = sizeFor(rand, cls);
      const primary = weighted<(typeof DEMO_TECHNIQUES)[number]>(rand, [
        ["pieced", 35], ["appliqué", 12], ["mixed", 10], ["art", 10], ["modern", 12], ["wholecloth", 4],
        ["paper piecing", 7], ["English paper piecing", 5], ["embroidery", 5],
      ]);
      const techniques: string[] = [primary];
      if (primary !== "wholecloth" && rand() < 0.3) {
        const extra = pick(["embroidery", "appliqué", "paper piecing"] as const);
        if (extra !== primary) techniques.push(extra);
      }

      // Who made and who quilted it.
      let madeBy = [entrant.name];
      let quiltedBy = entrant.name;
      let quiltedForHire = false;
      let quiltingMethod: DemoQuiltingMethod = weighted(rand, [["hand", 20], ["home_machine", 45], ["frame_machine", 35]]);
      const who = rand();
      if (who < 0.15 && !youth) {
        const partner = inventName();
        madeBy = [entrant.name, partner];
        quiltedBy = partner;
      } else if (who < 0.35 && !youth && cls !== "mini") {
        quiltedBy = `${inventName()}, ${pick(LONGARM_STUDIOS)}`;
        quiltedForHire = true;
        quiltingMethod = "frame_machine";
      } else if (who < 0.42 || (youth && who < 0.6)) {
        quiltedBy = inventName(); // a friend or, for youth entrants, a grown-up at home
        if (quiltingMethod === "frame_machine" && youth) quiltingMethod = "home_machine";
      }
      if (primary === "wholecloth" && quiltingMethod === "home_machine") quiltingMethod = "hand";
      if (primary === "English paper piecing" && !quiltedForHire && rand() < 0.6) quiltingMethod = "hand";

      const original = primary === "art" || primary === "wholecloth" || rand() < 0.45;
      const patternSource = original ? "original" : `${pick(PATTERNS)} by ${pick(DESIGNERS)}`;

      const opener = youth && k === 0 ? YOUTH_OPENER : entrant.division === "first_time" && k === 0 ? FIRST_TIME_OPENER : pick(STATEMENT_OPENERS);
      const middle = rand() < 0.7 ? pick(STATEMENT_MIDDLES[primary] ?? [""]) : "";
      const statement = [opener, middle, pick(STATEMENT_CLOSERS)].filter(Boolean).join(" ");

      const [lo, hi] = { mini: [150, 600], wall: [300, 1500], lap: [500, 2000], bed: [800, 4000] }[cls] as [number, number];
      const declaredValueCents = Math.round(between(lo, hi) / 25) * 25 * 100;

      const createdAt = entrantsOpenAt + Math.floor(rand() * (now - 3 * 86_400_000 - entrantsOpenAt));
      const updatedAt = createdAt + between(1, 72) * 3_600_000;

      quilts.push({
        key: `q${String(q).padStart(3, "0")}`,
        entrantEmail: entrant.email,
        entryNumber: null,
        title: inventTitle(),
        widthIn,
        lengthIn,
        // Eighths of an inch are exact in floating point, so these are exact integers.
        widthUm: widthIn * UM_PER_INCH,
        lengthUm: lengthIn * UM_PER_INCH,
        sizeLabel: `${formatInches(widthIn * UM_PER_INCH, false)} × ${formatInches(lengthIn * UM_PER_INCH)}`,
        techniques,
        madeBy,
        quiltedBy,
        quiltedForHire,
        quiltingMethod,
        patternSource,
        statement,
        declaredValueCents,
        judged: true,
        division: entrant.division ?? "open",
        status: "submitted",
        photoSeed: Math.floor(rand() * 2 ** 31),
        createdAt: new Date(createdAt).toISOString(),
        updatedAt: new Date(updatedAt).toISOString(),
      });
    }
  });

  // Status mix: entrant1 has one of each (paid, submitted, draft) so the demo shows every state;
  // seven more drafts elsewhere; of the rest about two in three are paid.
  const [first, second, third] = quilts;
  first!.status = "paid";
  second!.status = "submitted";
  third!.status = "draft";
  const others = quilts.slice(3);
  let drafts = 0;
  while (drafts < 7) {
    const quilt = others[Math.floor(rand() * others.length)]!;
    if (quilt.status !== "draft") {
      quilt.status = "draft";
      drafts++;
    }
  }
  for (const quilt of others) if (quilt.status !== "draft") quilt.status = rand() < 0.65 ? "paid" : "submitted";

  // Five quilts entered for display only (not judged).
  let display = 0;
  while (display < 5) {
    const quilt = others[Math.floor(rand() * others.length)]!;
    if (quilt.judged && quilt.division === "open") {
      quilt.judged = false;
      display++;
    }
  }

  // Entry numbers from 101, in the order the entries were submitted; drafts have none yet.
  const submitted = quilts.filter((x) => x.status !== "draft").sort((a, b) => a.updatedAt.localeCompare(b.updatedAt) || a.key.localeCompare(b.key));
  submitted.forEach((quilt, i) => {
    quilt.entryNumber = 101 + i;
  });

  return { town: TOWN, show: DEMO_SHOW, people, quilts };
}

let cached: DemoScenario | null = null;

/** The whole scenario; built once per process and the same on every run. Treat it as read-only. */
export function demoScenario(): DemoScenario {
  cached ??= buildDemoScenario();
  return cached;
}

/** Every demo sign-in (all share DEMO_PASSWORD), for the start script and the README. */
export const DEMO_ACCOUNTS: readonly DemoAccount[] = demoScenario().people.map(({ role, name, email }) => ({ role, name, email }));

/** The demo show's settings: fees in cents, limits, photo rules (one show's published rule: at
 *  least 1000 × 500 px, at most 5 MB). Amounts are invented for the scenario. */
export const DEMO_SETTINGS = {
  lateFeeFromAt: iso("2027-01-16T00:00:00-06:00"),
  entryFeeCents: 2500,
  memberEntryFeeCents: 2000,
  lateFeeCents: 1000,
  critiqueFeeCents: 500,
  feeCapCents: 10000,
  withdrawalRefundPercent: 50,
  currency: "usd",
  maxEntriesPerEntrant: 5,
  maxEntriesPerCategory: 2,
  capacity: 200,
  requiredPhotoViews: ["full", "detail"],
  photoMinWidthPx: 1000,
  photoMinHeightPx: 500,
  photoMaxBytes: 5_000_000,
  statementWordLimit: 150,
  techniques: ["pieced", "appliqué", "mixed", "art", "modern", "wholecloth", "paper piecing", "English paper piecing", "embroidery"],
  juried: false,
  publishNames: true,
  replyToEmail: "show@pennywhistle-quilters.test",
};

export const DEMO_RULES = {
  rulesText: [
    "1. Quilts must be finished by the entrant within the last three years and not shown at this show before.",
    "2. Each quilt needs a 4-inch hanging sleeve sewn to the top of the back and a label sewn to the lower right corner of the back with the entrant's name.",
    "3. Register the size as width (side to side) × length (top to bottom); the intake desk re-measures, and a quilt more than 1 inch off its registered size may be moved to another category.",
    "4. Bring each quilt in a cloth bag or pillowcase marked with your name and entry number.",
    "5. Quilts stay in the show until it closes; pick-up is against the claim ticket only.",
  ].join("\n"),
  releaseText:
    "The Pennywhistle Falls Quilters' Guild takes every reasonable care of the quilts in its keeping but does not insure them. I enter at my own risk, release the guild and its volunteers from liability for loss or damage, and agree that photographs of my quilt may be used to publicise the show.",
};
