import type { FindOptions, Model, ModelStatic, WhereOptions } from 'sequelize';
import { AppError } from './app-error';

/**
 * A row by id inside one workspace, or 404. Every child-row lookup goes through here, so another
 * workspace's row is never found.
 */
export async function findInWorkspace<M extends Model>(
  model: ModelStatic<M>,
  id: string,
  workspaceId: string,
  what: string,
  options: Omit<FindOptions<M>, 'where'> & { where?: WhereOptions } = {},
): Promise<M> {
  const { where, ...rest } = options;
  const row = await model.findOne({ ...rest, where: { ...(where as object), id, workspaceId } as WhereOptions });
  if (!row) throw AppError.notFound(what);
  return row;
}
