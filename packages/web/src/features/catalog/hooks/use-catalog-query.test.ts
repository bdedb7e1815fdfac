import { mountsSearchParams } from '../api/get-mounts';
import { parseCatalogQuery } from './use-catalog-query';

describe('the catalog query in the address', () => {
  it('reads filters, sort and page, ignoring what it does not know', () => {
    const query = parseCatalogQuery(
      new URLSearchParams('q=QM&supplier=2&type=open_spring,bogus,housed_spring&minLoadN=889.644&retired=1&sort=-ratedLoadN&page=3'),
    );
    expect(query).toEqual({
      q: 'QM',
      supplierId: 2,
      types: ['open_spring', 'housed_spring'],
      minLoadN: 889.644,
      maxLoadN: null,
      includeRetired: true,
      sort: { field: 'ratedLoadN', direction: 'desc' },
      page: 3,
      pageSize: 100,
    });
    expect(parseCatalogQuery(new URLSearchParams('page=0&sort=price&supplier=x'))).toMatchObject({
      page: 1,
      sort: null,
      supplierId: null,
    });
  });

  it('becomes the API query string with empty filters left out', () => {
    expect(mountsSearchParams(parseCatalogQuery(new URLSearchParams()))).toEqual({ page: '1', pageSize: '100' });
    expect(
      mountsSearchParams(parseCatalogQuery(new URLSearchParams('q=%20TE-%20&type=wire_rope&maxLoadN=2224.1108&sort=supplier'))),
    ).toEqual({ page: '1', pageSize: '100', q: 'TE-', type: 'wire_rope', maxLoadN: '2224.11', sort: 'supplier' });
  });
});
