import { notFound } from '../lib/errors';
import type { PreparationRow, PreparationsRepository, VersionRow } from './preparations-repository';

/** The lab's preparation, or 404 (a preparation of another lab is not found either). */
export async function findPreparation(
  preparations: Pick<PreparationsRepository, 'find'>,
  labId: number,
  id: number,
): Promise<PreparationRow> {
  const prep = await preparations.find(labId, id);
  if (!prep) throw notFound('The preparation');
  return prep;
}

/** The lab's preparation and one of its versions, or 404: the one lookup every service acting on a version makes. */
export async function findVersion(
  preparations: Pick<PreparationsRepository, 'find' | 'version'>,
  labId: number,
  id: number,
  number: number,
): Promise<{ prep: PreparationRow; version: VersionRow }> {
  const prep = await findPreparation(preparations, labId, id);
  const version = await preparations.version(id, number);
  if (!version) throw notFound(`Version ${number}`);
  return { prep, version };
}
