import type { BaleType, ForageType } from '../contracts/lots';
import { NITRATE_TEST_PROMPT, nitrateTestAdvised } from '../forage/nitrate';
import type { ForageClass, StorageKind } from '../contracts/enums';

/** A safety note shown with a lot; each ends by deferring to a professional or local guidance. */
export interface Caution {
  code: 'storage-moisture' | 'blister-beetles' | 'mould-dust' | 'high-nsc' | 'outside-storage' | 'botulism' | 'sorghum-type' | 'nitrate-test';
  title: string;
  message: string;
}

/**
 * Highest moisture at baling considered safe to store without preservative, % as fed, by bale type.
 * Alberta Agriculture, "Bale moisture" (after Collins): small rectangular 18–20%, large rectangular
 * 12–16%, rounds 4×4 and 4×5 ft 15–18%, rounds 5×5 and 5×6 ft 15%. The upper end of each range is used.
 */
export const SAFE_BALING_MOISTURE_PCT: Record<BaleType, number> = {
  small_square_2_string: 20,
  small_square_3_string: 20,
  large_square_3x3x8: 16,
  large_square_3x4x8: 16,
  large_square_4x4x8: 16,
  round_4x4: 18,
  round_4x5: 18,
  round_5x5: 15,
  round_5x6: 15,
};

export interface CautionInput {
  forageClass: ForageClass;
  baleType: BaleType;
  moistureAtBalingPct: number | null;
  storage: StorageKind;
  nscFlag: 'within-advised-limit' | 'above-strict-limit' | 'above-upper-limit' | null;
  /** Dry matter of the lab sample, % as fed, when known. */
  dryMatterPct?: number | null;
  /** The lot's forage type, when known: sorghum-type and small-grain hays get their own cautions. */
  forageType?: ForageType | null;
  /** Whether the current analysis includes a nitrate result. */
  nitrateTested?: boolean;
  /** Growing conditions the grower reported: a drought-stressed crop. */
  droughtStressed?: boolean;
  /** Growing conditions the grower reported: heavy nitrogen fertiliser or manure on the field. */
  heavyNitrogen?: boolean;
}

/*
 * Growing conditions that raise nitrate in any hay, not only the usual suspects: drought slows the plant's use of the
 * nitrate it has taken up, and plenty of soil nitrogen (heavy fertiliser or manure) gives it more to store
 * (UC ANR, Mathesius, Maier & Davy, "Drought conditions may increase the chances for risky levels of nitrate in
 * forages"; NC State Extension, Burch 2018, "Testing your hay is money well spent": drought, reduced sunlight and
 * excessive soil nitrogen; UConn Extension 2022: under 1,000 ppm nitrate-N on DM is considered safe).
 */
function growingConditions(lot: CautionInput): string | null {
  const said = [lot.droughtStressed ? 'drought-stressed' : null, lot.heavyNitrogen ? 'grown with heavy nitrogen fertiliser or manure' : null].filter((s) => s !== null);
  return said.length === 0 ? null : said.join(' and ');
}

function nitratePromptApplies(lot: CautionInput): boolean {
  if (lot.nitrateTested) return false;
  return nitrateTestAdvised({ forageType: lot.forageType ?? '', drought: lot.droughtStressed, heavyNitrogen: lot.heavyNitrogen });
}

/**
 * Sorghum-family hays. Extension specialists advise against feeding sorghum-family forages to horses: a poorly
 * understood, sometimes fatal urinary and nerve disorder (cystitis–ataxia), and foal defects when mares graze them
 * early in pregnancy (MSU Extension, Cassida 2012; NMSU Guide B-720, Turner, Marsalis & Creamer). Prussic acid
 * (HCN) mostly escapes as stems dry and crack in curing (OSU Extension, Boyles), but nitrate stays in the hay.
 */
export const SORGHUM_TYPE_FORAGES: ReadonlySet<ForageType> = new Set<ForageType>(['sudangrass', 'sorghum_sudangrass', 'forage_sorghum']);

/**
 * Above this moisture (% as fed) a bale ferments rather than cures: the top of Alberta Agriculture's safe
 * baling range for any bale type (20 %, small squares). Wet or wrapped bales of that kind (baleage,
 * haylage) carry a botulism risk to horses (Wright & Kenney, OMAFRA, domain brief S29).
 */
export const FERMENTING_BALE_MOISTURE_PCT = 20;

function isRound(baleType: BaleType): boolean {
  return baleType.startsWith('round');
}

/** The cautions that apply to a lot, most serious first. */
export function lotCautions(lot: CautionInput): Caution[] {
  const out: Caution[] = [];
  const safe = SAFE_BALING_MOISTURE_PCT[lot.baleType];
  if (lot.moistureAtBalingPct !== null && lot.moistureAtBalingPct > safe) {
    out.push({
      code: 'storage-moisture',
      title: 'Baled wetter than safe storage moisture',
      message:
        `This lot was baled at ${lot.moistureAtBalingPct}% moisture, above the ${safe}% usually advised for this bale type. ` +
        'Wet hay can heat, lose protein and catch fire in the stack. Check bale temperatures with a probe thermometer ' +
        '(150 °F: check twice a day; 175 °F: call the fire service) and follow local fire guidance.',
    });
  }
  const labMoisture = lot.dryMatterPct === null || lot.dryMatterPct === undefined ? null : 100 - lot.dryMatterPct;
  const wettest = Math.max(lot.moistureAtBalingPct ?? 0, labMoisture ?? 0);
  if (wettest > FERMENTING_BALE_MOISTURE_PCT) {
    // Legumes resist the acid fermentation that keeps clostridia down (pH 4.5, S29), so wet alfalfa is the riskier case (from memory).
    const forage =
      lot.forageClass === 'grass'
        ? ''
        : ' Legume hay such as alfalfa ferments less well than grass, so wet or wrapped legume bales are the riskier kind.';
    const bale = isRound(lot.baleType) ? ' Large round bales wrapped wet, or with torn wrap, are the classic source.' : '';
    out.push({
      code: 'botulism',
      title: 'Wet or wrapped bales: botulism risk',
      message:
        `At about ${wettest.toFixed(0)}% moisture these bales ferment rather than cure, like baleage, which can carry botulism; horses are the most sensitive livestock to it.${bale}${forage} ` +
        'Do not feed bales that are torn, smell off or hold animal remains, and ask your veterinarian about botulism vaccination before feeding wet or wrapped hay.',
    });
  }
  const sorghum = lot.forageType !== null && lot.forageType !== undefined && SORGHUM_TYPE_FORAGES.has(lot.forageType);
  if (sorghum) {
    out.push({
      code: 'sorghum-type',
      title: 'Sorghum-type hay: prussic acid and nitrate',
      message:
        'Sudangrass, sorghum-sudangrass and forage sorghum can hold prussic acid (cyanide) and nitrate. Most prussic acid escapes as ' +
        'the hay cures, but nitrate does not, and extension specialists advise against feeding sorghum-family forages to horses at all: ' +
        'they have been linked to a sometimes fatal urinary and nerve disorder, and to foal defects in pregnant mares. ' +
        'Do not feed it to horses without your veterinarian\'s advice.',
    });
  }
  if (nitratePromptApplies(lot)) {
    const conditions = growingConditions(lot);
    out.push({
      code: 'nitrate-test',
      title: 'No nitrate result for a hay that can carry it',
      message:
        (conditions ? `The grower reports this hay was ${conditions}, which can raise its nitrate. ` : '') +
        `${NITRATE_TEST_PROMPT} Ask the grower for a nitrate result, and your veterinarian before feeding it, especially to pregnant mares.`,
    });
  }
  if (lot.forageClass !== 'grass') {
    out.push({
      code: 'blister-beetles',
      title: 'Blister beetles in alfalfa',
      message:
        'Alfalfa can carry blister beetles, whose toxin (cantharidin) can kill horses even in small numbers and stays in the hay ' +
        'after the beetles are removed. Ask the grower how the hay was cut, inspect flakes before feeding, and talk to your veterinarian.',
    });
  }
  if (lot.nscFlag === 'above-strict-limit' || lot.nscFlag === 'above-upper-limit') {
    out.push({
      code: 'high-nsc',
      title: 'Sugar and starch above the usual limit for metabolic horses',
      message:
        'NSC above about 10–12% of dry matter is commonly advised against for horses with insulin dysregulation or a history of laminitis. ' +
        'Ask your veterinarian or an equine nutritionist before feeding it to such horses.',
    });
  }
  if (lot.storage === 'outside') {
    out.push({
      code: 'outside-storage',
      title: 'Stored outside',
      message: 'Hay stored uncovered loses dry matter and can mould on the outer layers. Inspect bales on delivery.',
    });
  }
  out.push({
    code: 'mould-dust',
    title: 'Mould and dust',
    message:
      'A lab report does not show mould or dust. Mouldy or dusty hay can cause respiratory disease (heaves) and carry mycotoxins: ' +
      'do not feed it to horses. Check each bale, and ask your veterinarian if in doubt.',
  });
  return out;
}

/**
 * The same cautions written for the grower listing the lot: what it means for their stack and what buyers
 * will be told. Same codes and order as `lotCautions`, so both sides talk about the same thing.
 */
export function growerCautions(lot: CautionInput): Caution[] {
  const safe = SAFE_BALING_MOISTURE_PCT[lot.baleType];
  const forGrower: Record<Caution['code'], (c: Caution) => Caution> = {
    'storage-moisture': (c) => ({
      ...c,
      title: 'Your stack may heat',
      message:
        `You baled at ${lot.moistureAtBalingPct}% moisture, above the ${safe}% usually advised for this bale type. Probe the stack ` +
        'with a hay thermometer for the next weeks (150 °F: check twice a day and open the stack; 175 °F: call the fire service, ' +
        'do not move the bales yourself) and follow local fire guidance. Buyers are told the moisture at baling.',
    }),
    'blister-beetles': (c) => ({
      ...c,
      title: 'Buyers of alfalfa ask about blister beetles',
      message:
        'Buyers are told that blister beetles can be baled into alfalfa. Say in the description how the hay was cut (with or without ' +
        'a conditioner or crimper) and whether you scouted for beetles before cutting; your extension office can advise on timing.',
    }),
    'high-nsc': (c) => ({
      ...c,
      title: 'Sugar and starch above the usual limit for metabolic horses',
      message:
        'Buyers with horses prone to laminitis are told this lot is above the 10–12% NSC often advised and to ask their ' +
        'veterinarian. It still suits many horses; say so plainly in the description rather than leave buyers to guess.',
    }),
    botulism: (c) => ({
      ...c,
      title: 'Wet or wrapped bales can carry botulism',
      message:
        'Bales this wet ferment like baleage. Buyers are told about botulism and to ask their veterinarian; keep wrap whole, ' +
        'set aside torn or off-smelling bales, and say in the description how the bales were made and stored.',
    }),
    'outside-storage': (c) => ({
      ...c,
      title: 'Stored outside',
      message: 'Buyers are told the hay is uncovered. Covering the stack or moving it under a roof keeps dry matter and protects outer layers from mould.',
    }),
    'sorghum-type': (c) => ({
      ...c,
      title: 'Buyers are warned about sorghum-type hay',
      message:
        'Horse owners are told that extension specialists advise against feeding sorghum-family forages to horses, and that nitrate ' +
        'stays in the cured hay. Test it for nitrate (and prussic acid if it was cut after drought or frost) and say in the description ' +
        'which livestock it suits; ask your extension office about safe cutting after drought or frost.',
    }),
    'nitrate-test': (c) => ({
      ...c,
      title: 'Test this hay for nitrate',
      message:
        (growingConditions(lot) ? `You report this hay was ${growingConditions(lot)}, which can raise its nitrate. ` : '') +
        `${NITRATE_TEST_PROMPT} Buyers are told when a lot of this kind has no nitrate result; enter it with the lab values ` +
        '(most labs run it on the same sample). Buyers are also told to ask their veterinarian before feeding it to pregnant mares.',
    }),
    'mould-dust': (c) => ({
      ...c,
      title: 'Mould and dust',
      message:
        'A lab report does not show mould or dust, so buyers inspect each bale on delivery. List only hay you would feed ' +
        'to a horse yourself; bales that are mouldy or dusty can be refused.',
    }),
  };
  return lotCautions(lot).map((c) => forGrower[c.code](c));
}
