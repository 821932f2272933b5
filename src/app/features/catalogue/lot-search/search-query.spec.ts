import { apiQueryFor, describeQuery, filledParams, hasAnyFilter, queryFromForm } from './search-query';

describe('queryFromForm', () => {
  it('treats an emptied number field (null) as no filter, never the text "null" in the URL', () => {
    const query = queryFromForm({ rfvMin: null, cpMin: 18, zip: '66502' });
    expect(query['rfvMin']).toBeUndefined();
    expect(query['cpMin']).toBe('18');
  });

  it('drops empty fields and unticked boxes so shared links stay short', () => {
    expect(queryFromForm({ rfvMin: '150', cpMin: '', zip: ' 66502 ', compliantOnly: true, verifiedOnly: false })).toMatchObject({
      rfvMin: '150',
      cpMin: undefined,
      zip: '66502',
      compliantOnly: 'true',
      verifiedOnly: undefined,
    });
  });
});

describe('apiQueryFor', () => {
  it('drops "nearest" when no ZIP is given and says why, instead of sending a query the API refuses', () => {
    const out = apiQueryFor({ sort: 'distance', rfvMin: '150' });
    expect(out.query).toEqual({ rfvMin: '150' });
    expect(out.notice).toMatch(/ZIP/);
  });
  it('keeps "nearest" with a ZIP', () => {
    expect(apiQueryFor({ sort: 'distance', zip: '66502' })).toEqual({ query: { sort: 'distance', zip: '66502' }, notice: null });
  });
});

describe('hasAnyFilter', () => {
  it('does not count a sort or a page as a filter', () => {
    expect(hasAnyFilter({ sort: 'price', page: '2' })).toBe(false);
    expect(hasAnyFilter({ sort: 'price', cpMin: '18' })).toBe(true);
  });
});

describe('describeQuery', () => {
  it('says what a saved search holds in words', () => {
    expect(describeQuery({ rfvMin: '150', cpMin: '18', forageType: 'alfalfa', zip: '66502', radiusMi: '50', sort: 'price' }, { alfalfa: 'Alfalfa' })).toBe(
      'RFV from 150 · CP from 18% · Forage: Alfalfa · within 50 mi of 66502 · sorted by price per ton',
    );
  });

  it('names every tick filter in words, without the URL value', () => {
    expect(describeQuery({ compliantOnly: 'true', verifiedOnly: 'true', nitrateTestedOnly: 'true' })).toBe(
      'sampled to protocol only · certified lab only · nitrate tested only',
    );
  });
});

describe('filledParams', () => {
  it('reads a form the browser sent itself (every field named, most of them empty) as only the filled filters', () => {
    const sent = Object.fromEntries(new URLSearchParams('q=&rfvMin=120&rfvMax=&forageType=&compliantOnly=true&sort=price'));
    expect(filledParams(sent)).toEqual({ rfvMin: '120', compliantOnly: 'true', sort: 'price' });
    expect(hasAnyFilter(filledParams({ q: '', cpMin: '' }))).toBe(false);
  });
});
