import { ConflictException } from '@nestjs/common';
import type { Repository } from 'typeorm';
import type { CatalogRevisionService } from '../catalog-revision/catalog-revision.service.js';
import type { ProjectsService } from '../projects/projects.service.js';
import type { SelectionCatalogReader } from '../selection/selection-catalog.reader.js';
import type { SelectionService } from '../selection/selection.service.js';
import { buildUser } from '../../test/factories/user.factory.js';
import type { DesignSelection } from './design-selection.entity.js';
import { Design } from './design.entity.js';
import { DesignsService, STALE_VERSION } from './designs.service.js';

/** The optimistic lock at the statement: the version read is the one the UPDATE requires. */
describe('DesignsService.update', () => {
  const author = buildUser({ id: 7, role: 'engineer' });
  const stored = Object.assign(new Design(), { id: 3, status: 'draft', version: 4, authorId: 7, input: {} });

  function serviceWith(affected: number) {
    const calls: { set?: Record<string, unknown>; where?: string; params?: Record<string, unknown> } = {};
    const builder = {
      update: () => builder,
      set: (values: Record<string, unknown>) => ((calls.set = values), builder),
      where: (where: string, params: Record<string, unknown>) => ((calls.where = where), (calls.params = params), builder),
      execute: async () => ({ affected }),
    };
    const repo = {
      find: async () => [stored],
      createQueryBuilder: () => builder,
    } as unknown as Repository<Design>;
    const service = new DesignsService(
      repo,
      {} as Repository<DesignSelection>,
      {} as ProjectsService,
      {} as SelectionService,
      {} as SelectionCatalogReader,
      {} as CatalogRevisionService,
    );
    return { service, calls };
  }

  it('answers 409 and writes nothing when the UPDATE … WHERE version = ? changes no row', async () => {
    const { service, calls } = serviceWith(0);
    await expect(service.update(author, 3, { version: 4, name: 'Late' })).rejects.toEqual(new ConflictException(STALE_VERSION));
    expect(calls.where).toBe('id = :id AND version = :version AND status = :status');
    expect(calls.params).toEqual({ id: 3, version: 4, status: 'draft' });
    expect(calls.set).toMatchObject({ name: 'Late' });
    expect((calls.set!.version as () => string)()).toBe('"version" + 1');
  });

  it('refuses a stale version before computing anything', async () => {
    const { service, calls } = serviceWith(1);
    await expect(service.update(author, 3, { version: 3, name: 'Late' })).rejects.toEqual(new ConflictException(STALE_VERSION));
    expect(calls.set).toBeUndefined();
  });
});
