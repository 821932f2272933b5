import { OpenClaimSchema } from '@shared/contracts/claims';
import { claimRequest, emptyClaimDraft, missingInDraft, RETEST_FIELDS } from './claim-form';

describe('claim form', () => {
  it('sends only the reason when the buyer has no retest', () => {
    const draft = { ...emptyClaimDraft(), reason: '  Dusty bales through the whole load.  ', labName: 'left over' };
    expect(claimRequest(7, draft)).toEqual({ orderId: 7, reason: 'Dusty bales through the whole load.' });
    expect(missingInDraft(draft)).toBeNull();
  });

  it('sends the retest with its basis, typed numbers as numbers, a decimal comma read as a point, blanks left out', () => {
    const draft = {
      ...emptyClaimDraft(),
      reason: 'Our lab found much less protein than listed.',
      withRetest: true,
      labName: ' Invented Valley Lab ',
      reportDate: '2026-09-14',
      basis: 'asFed' as const,
      values: { dryMatterPct: '88', crudeProteinPct: '14,5', adfPct: '33.2', ndfPct: '45', calciumPct: '  ' },
    };
    const body = claimRequest(7, draft);
    expect(body.retest).toEqual({ labName: 'Invented Valley Lab', labCertified: true, reportDate: '2026-09-14', values: { basis: 'asFed', dryMatterPct: 88, crudeProteinPct: 14.5, adfPct: 33.2, ndfPct: 45 } });
    // The body passes the API's own contract unchanged.
    expect(OpenClaimSchema.parse(body)).toEqual(body);
  });

  it('names what is still missing: the reason, the lab, the date, then each figure the engine needs to grade', () => {
    const draft = { ...emptyClaimDraft(), reason: 'too short' };
    expect(missingInDraft(draft)).toMatch(/at least 10 characters/);
    const withRetest = { ...draft, reason: 'Leafless, stemmy hay throughout.', withRetest: true };
    expect(missingInDraft(withRetest)).toMatch(/Name the lab/);
    expect(missingInDraft({ ...withRetest, labName: 'Lab' })).toMatch(/date/);
    expect(missingInDraft({ ...withRetest, labName: 'Lab', reportDate: '2026-09-14', values: { dryMatterPct: '88', crudeProteinPct: '15', adfPct: '34' } })).toMatch(/Neutral detergent fibre/);
  });

  it('on an order of several lots, names the chosen lot, and asks which lot a retest is of', () => {
    const draft = { ...emptyClaimDraft(), reason: 'Mould inside the second lot’s bales.' };
    expect(claimRequest(7, { ...draft, lineId: '12' })).toEqual({ orderId: 7, lineId: 12, reason: 'Mould inside the second lot’s bales.' });
    expect(missingInDraft(draft, 2)).toBeNull();
    const withRetest = { ...draft, withRetest: true };
    expect(missingInDraft(withRetest, 2)).toMatch(/Choose the lot/);
    expect(missingInDraft({ ...withRetest, lineId: '12' }, 2)).toMatch(/Name the lab/);
  });

  it('offers an input for every nutrient an admin compares, dry matter, CP, ADF and NDF required (the RFV inputs)', () => {
    expect(RETEST_FIELDS.filter((f) => f.required).map((f) => f.field)).toEqual(['dryMatterPct', 'crudeProteinPct', 'adfPct', 'ndfPct']);
    expect(RETEST_FIELDS.length).toBeGreaterThan(4);
  });
});
