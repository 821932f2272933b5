import { growerCautions, lotCautions, SAFE_BALING_MOISTURE_PCT } from './lot-cautions';

const base = { forageClass: 'grass' as const, baleType: 'small_square_2_string' as const, moistureAtBalingPct: 15, storage: 'barn' as const, nscFlag: null };
const codes = (input: Parameters<typeof lotCautions>[0]) => lotCautions(input).map((c) => c.code);

describe('lotCautions', () => {
  it('uses the published safe baling moisture per bale type', () => {
    // Source: Alberta Agriculture, "Bale moisture" (after Collins): small rectangular 18–20%, large rectangular 12–16%,
    // rounds 4×4/4×5 15–18%, rounds 5×5/5×6 15% (upper end of each range).
    expect(SAFE_BALING_MOISTURE_PCT.small_square_2_string).toBe(20);
    expect(SAFE_BALING_MOISTURE_PCT.large_square_4x4x8).toBe(16);
    expect(SAFE_BALING_MOISTURE_PCT.round_4x5).toBe(18);
    expect(SAFE_BALING_MOISTURE_PCT.round_5x6).toBe(15);
  });

  it('warns about heating and fire only above the safe moisture for the bale type', () => {
    expect(codes({ ...base, moistureAtBalingPct: 20 })).not.toContain('storage-moisture');
    expect(codes({ ...base, moistureAtBalingPct: 20.5 })).toContain('storage-moisture');
    expect(codes({ ...base, baleType: 'round_5x5', moistureAtBalingPct: 16 })).toContain('storage-moisture');
    expect(codes({ ...base, moistureAtBalingPct: null })).not.toContain('storage-moisture');
  });

  it('warns about blister beetles for alfalfa and mixes but not for grass (Texas AgriLife; common practice)', () => {
    expect(codes({ ...base, forageClass: 'legume' })).toContain('blister-beetles');
    expect(codes({ ...base, forageClass: 'mixed' })).toContain('blister-beetles');
    expect(codes(base)).not.toContain('blister-beetles');
  });

  it('flags NSC above the strict limit for metabolic horses (Frank et al. 2010, ACVIM consensus: < 10–12% DM)', () => {
    expect(codes({ ...base, nscFlag: 'above-strict-limit' })).toContain('high-nsc');
    expect(codes({ ...base, nscFlag: 'within-advised-limit' })).not.toContain('high-nsc');
  });

  it('always reminds about mould and dust, and every caution defers to a professional or checks', () => {
    const all = lotCautions({ forageClass: 'legume', baleType: 'round_5x5', moistureAtBalingPct: 19, storage: 'outside', nscFlag: 'above-upper-limit' });
    expect(all.map((c) => c.code)).toEqual(['storage-moisture', 'blister-beetles', 'high-nsc', 'outside-storage', 'mould-dust']);
    for (const c of all.filter((c) => c.code !== 'outside-storage')) expect(c.message).toMatch(/veterinarian|fire service|fire guidance/);
  });
});

describe('lotCautions — botulism in wet or wrapped bales', () => {
  // Wright & Kenney, OMAFRA (domain brief S29): wet, fermented round-bale haylage and torn wrap carry botulism;
  // horses are the most sensitive domestic species. Alberta Agriculture: 20 % is the top of any safe baling range.
  it('cautions when the bales were made or tested above 20 % moisture, and not at or below it', () => {
    expect(codes({ ...base, moistureAtBalingPct: 20 })).not.toContain('botulism');
    expect(codes({ ...base, moistureAtBalingPct: 35, baleType: 'round_4x5' })).toContain('botulism');
    expect(codes({ ...base, moistureAtBalingPct: null, dryMatterPct: 60 })).toContain('botulism');
    expect(codes({ ...base, moistureAtBalingPct: null, dryMatterPct: 88 })).not.toContain('botulism');
  });

  it('says more for legume and round bales, and defers to a veterinarian', () => {
    const alfalfa = lotCautions({ ...base, forageClass: 'legume', baleType: 'round_5x5', moistureAtBalingPct: 45 }).find((c) => c.code === 'botulism')!;
    expect(alfalfa.message).toMatch(/legume bales are the riskier kind/);
    expect(alfalfa.message).toMatch(/Large round bales wrapped wet/);
    expect(alfalfa.message).toMatch(/veterinarian/);
    const grass = lotCautions({ ...base, moistureAtBalingPct: 45 }).find((c) => c.code === 'botulism')!;
    expect(grass.message).not.toMatch(/legume/);
  });
});

describe('growerCautions', () => {
  const wet = { ...base, forageClass: 'legume' as const, moistureAtBalingPct: 24, storage: 'outside' as const, nscFlag: 'above-upper-limit' as const };

  it('covers the same cautions as the buyers see, in the same order', () => {
    expect(growerCautions(wet).map((c) => c.code)).toEqual(lotCautions(wet).map((c) => c.code));
  });

  // Stack temperature thresholds: 150 °F check often, 175 °F call the fire department (Penn State / Purdue extension; common practice).
  it('tells the grower to watch the stack temperature and when to call the fire service', () => {
    const heat = growerCautions(wet).find((c) => c.code === 'storage-moisture')!;
    expect(heat.message).toMatch(/150 °F/);
    expect(heat.message).toMatch(/175 °F: call the fire service/);
  });

  it('speaks to the grower, not to a buyer deciding what to feed', () => {
    for (const c of growerCautions(wet)) expect(c.message).not.toMatch(/before feeding it to such horses|inspect flakes before feeding/);
  });
});

describe('lotCautions — sorghum-type hay and the nitrate prompt', () => {
  // MSU Extension (Cassida 2012): "Forages in the sorghum family should never be fed to horses"; NMSU Guide B-720 on
  // sorghum, sudangrass and sorghum-sudangrass hybrids and horses; nitrate stays in cured hay (OSU Extension, Boyles).
  it('warns about sorghum-type hays and defers to a veterinarian (MSU Extension; NMSU B-720)', () => {
    for (const forageType of ['sudangrass', 'sorghum_sudangrass', 'forage_sorghum'] as const) {
      const sorghum = lotCautions({ ...base, forageType, nitrateTested: true }).find((c) => c.code === 'sorghum-type');
      expect(sorghum?.message).toMatch(/prussic acid/);
      expect(sorghum?.message).toMatch(/veterinarian/);
    }
    expect(codes({ ...base, forageType: 'timothy' })).not.toContain('sorghum-type');
  });

  // Small-grain and sorghum-type hays carry nitrate (Oklahoma State 2024; NC State Extension "Nitrates 101").
  it('prompts for a nitrate test on oat and sorghum-type hay without a nitrate result, and not once it is tested', () => {
    expect(codes({ ...base, forageType: 'oat' })).toContain('nitrate-test');
    expect(codes({ ...base, forageType: 'sorghum_sudangrass' })).toContain('nitrate-test');
    expect(codes({ ...base, forageType: 'oat', nitrateTested: true })).not.toContain('nitrate-test');
    expect(codes({ ...base, forageType: 'alfalfa' })).not.toContain('nitrate-test');
    expect(lotCautions({ ...base, forageType: 'oat' }).find((c) => c.code === 'nitrate-test')!.message).toMatch(/veterinarian/);
  });

  // Drought and heavy soil nitrogen raise nitrate in any hay (UC ANR, Mathesius, Maier & Davy: drought and nitrogen
  // fertiliser; NC State Extension, Burch 2018: drought, reduced sunlight, excessive soil nitrogen).
  it('prompts for a nitrate test on any hay the grower reports drought-stressed or heavily fertilised, until a result is given', () => {
    const grass = { ...base, forageType: 'timothy' as const };
    expect(codes(grass)).not.toContain('nitrate-test');
    for (const conditions of [{ droughtStressed: true }, { heavyNitrogen: true }]) {
      expect(codes({ ...grass, ...conditions })).toContain('nitrate-test');
      expect(codes({ ...grass, ...conditions, nitrateTested: true })).not.toContain('nitrate-test');
      expect(growerCautions({ ...grass, ...conditions }).map((c) => c.code)).toContain('nitrate-test');
    }
    const buyer = lotCautions({ ...grass, droughtStressed: true, heavyNitrogen: true }).find((c) => c.code === 'nitrate-test')!;
    expect(buyer.message).toMatch(/^The grower reports this hay was drought-stressed and grown with heavy nitrogen fertiliser or manure/);
    expect(buyer.message).toMatch(/veterinarian/);
    const grower = growerCautions({ ...grass, heavyNitrogen: true }).find((c) => c.code === 'nitrate-test')!;
    expect(grower.message).toMatch(/^You report this hay was grown with heavy nitrogen fertiliser or manure/);
    expect(grower.message).toMatch(/veterinarian/);
  });

  it('tells the grower of a sorghum-type lot to test for nitrate, in words written for the grower', () => {
    const grower = growerCautions({ ...base, forageType: 'forage_sorghum' });
    expect(grower.map((c) => c.code)).toEqual(expect.arrayContaining(['sorghum-type', 'nitrate-test']));
    expect(grower.find((c) => c.code === 'nitrate-test')!.message).toMatch(/enter it with the lab values/);
  });
});
