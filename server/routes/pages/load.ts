import { IdSchema } from '@shared/schemas/common.ts';
import { Page } from '../../models/index.ts';

/** Loads a page by the id in the URL; a malformed or unknown id loads nothing (authorize then refuses). */
export async function findPage(id: unknown): Promise<Page | null> {
  return IdSchema.safeParse(id).success ? Page.findByPk(id as string) : null;
}
