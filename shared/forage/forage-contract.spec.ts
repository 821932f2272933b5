import { ForageEvaluationRequestSchema, SamplingRecordSchema } from './forage-contract';

const minimal = { forageClass: 'legume', basis: 'dm', dryMatterPct: 88, crudeProteinPct: 20, adfPct: 30, ndfPct: 40 };

describe('forage-contract', () => {
  describe('ForageEvaluationRequestSchema', () => {
    it('accepts the four required nutrients with class, basis and dry matter', () => {
      expect(ForageEvaluationRequestSchema.parse(minimal)).toEqual(minimal);
    });

    it('accepts every optional lab value', () => {
      const full = {
        ...minimal,
        ndfd48Pct: 45,
        fatPct: 2.5,
        ashPct: 10,
        escPct: 6.8,
        wscPct: 9.5,
        starchPct: 1.8,
        calciumPct: 1.4,
        phosphorusPct: 0.3,
        moisturePct: 12,
        reportedRfv: 152,
      };
      expect(ForageEvaluationRequestSchema.parse(full)).toEqual(full);
    });

    it.each([
      ['dryMatterPct', 0, 'dryMatterPct must be greater than 0%'],
      ['dryMatterPct', 100.1, 'dryMatterPct cannot exceed 100%'],
      ['crudeProteinPct', -0.1, 'crudeProteinPct (crude protein) cannot be negative'],
      ['adfPct', 100.5, 'adfPct (acid detergent fibre) cannot exceed 100%'],
      ['ndfPct', 0, 'ndfPct (neutral detergent fibre) must be at least 1%'],
      ['ndfPct', 0.5, 'ndfPct (neutral detergent fibre) must be at least 1%'],
      ['fatPct', 101, 'fatPct (crude fat / ether extract) cannot exceed 100%'],
      ['ndfd48Pct', -1, 'ndfd48Pct (48-h NDF digestibility, % of NDF) cannot be negative'],
      ['moisturePct', 100, 'moisturePct must be below 100%'],
      ['reportedRfv', 0, 'reportedRfv must be greater than 0'],
      ['crudeProteinPct', '20', 'crudeProteinPct (crude protein) must be a number, in percent'],
      ['crudeProteinPct', Number.NaN, 'crudeProteinPct (crude protein) must be a number, in percent'],
      ['crudeProteinPct', Number.POSITIVE_INFINITY, 'crudeProteinPct (crude protein) must be a number, in percent'],
    ])('rejects %s = %s with a clear message', (field, value, message) => {
      const result = ForageEvaluationRequestSchema.safeParse({ ...minimal, [field]: value });
      expect(result.success).toBe(false);
      expect(result.error?.issues[0]?.path).toEqual([field]);
      expect(result.error?.issues[0]?.message).toContain(message);
    });

    it('rejects unknown fields', () => {
      const result = ForageEvaluationRequestSchema.safeParse({ ...minimal, rfq: 150 });
      expect(result.success).toBe(false);
      expect(result.error?.issues[0]?.code).toBe('unrecognized_keys');
    });

    it('rejects a missing required field or an unknown class', () => {
      const { adfPct: _adf, ...withoutAdf } = minimal;
      expect(ForageEvaluationRequestSchema.safeParse(withoutAdf).success).toBe(false);
      expect(ForageEvaluationRequestSchema.safeParse({ ...minimal, forageClass: 'straw' }).success).toBe(false);
      expect(ForageEvaluationRequestSchema.safeParse({ ...minimal, basis: 'wet' }).success).toBe(false);
    });

    it('rejects an as-fed nutrient larger than the dry matter it is part of', () => {
      const result = ForageEvaluationRequestSchema.safeParse({ ...minimal, basis: 'asFed', dryMatterPct: 30, ndfPct: 35 });
      expect(result.success).toBe(false);
      expect(result.error?.issues[0]?.path).toEqual(['ndfPct']);
      expect(result.error?.issues[0]?.message).toContain('cannot exceed dryMatterPct');
    });

    it('allows the same values on a DM basis', () => {
      expect(ForageEvaluationRequestSchema.safeParse({ ...minimal, dryMatterPct: 30, ndfPct: 35 }).success).toBe(true);
    });

    it('does not cap NDFD (a share of NDF) or reported RFV by dry matter on an as-fed basis', () => {
      const result = ForageEvaluationRequestSchema.safeParse({
        ...minimal,
        basis: 'asFed',
        dryMatterPct: 30,
        crudeProteinPct: 5,
        adfPct: 9,
        ndfPct: 12,
        ndfd48Pct: 50,
        reportedRfv: 120,
      });
      expect(result.success).toBe(true);
    });
  });

  describe('SamplingRecordSchema', () => {
    const record = {
      sampledOn: '2024-07-15',
      coresTaken: 20,
      balesSampled: 20,
      probeDiameterIn: 0.5,
      probeLengthIn: 18,
      corePosition: 'butt-end-centre',
      baleShape: 'small-square',
      harvestStartedOn: '2024-06-10T07:30:00-06:00',
      harvestEndedOn: '2024-06-11',
      lotTons: 120,
      sampledBy: 'Dana Reyes',
    };

    it('accepts a complete record with dates or date-times', () => {
      expect(SamplingRecordSchema.parse(record)).toEqual(record);
    });

    it('accepts a grab sample without probe measurements', () => {
      const { probeDiameterIn: _d, probeLengthIn: _l, ...rest } = record;
      expect(SamplingRecordSchema.safeParse({ ...rest, corePosition: 'grab' }).success).toBe(true);
    });

    it.each([
      ['sampledOn', '2024-02-30'],
      ['sampledOn', '15/07/2024'],
      ['coresTaken', 20.5],
      ['coresTaken', 0],
      ['probeDiameterIn', 0],
      ['corePosition', 'top'],
      ['baleShape', 'big-round'],
      ['lotTons', 0],
      ['sampledBy', '   '],
    ])('rejects %s = %j', (field, value) => {
      const result = SamplingRecordSchema.safeParse({ ...record, [field]: value });
      expect(result.success).toBe(false);
      expect(result.error?.issues[0]?.path).toEqual([field]);
    });

    it('rejects unknown fields', () => {
      expect(SamplingRecordSchema.safeParse({ ...record, lab: 'Fieldside Lab' }).success).toBe(false);
    });
  });
});
