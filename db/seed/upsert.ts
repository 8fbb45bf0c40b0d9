/** Inserts a row keyed by a natural key, or finds the one a previous run inserted. */
export async function upsertBy<T extends Record<string, unknown>>(
  insert: () => Promise<T[]>,
  find: () => Promise<T[]>,
): Promise<T> {
  const [row] = await insert();
  if (row) return row;
  const [existing] = await find();
  return existing;
}
