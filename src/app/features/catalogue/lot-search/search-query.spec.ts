import { queryFromForm } from './search-query';

describe('queryFromForm', () => {
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
