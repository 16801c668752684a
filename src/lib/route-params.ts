/** A record's id or version number from the URL: a whole number above zero, else null (the page then says not found). */
export const idFromParam = (value: string | undefined): number | null => {
  const id = Number(value);
  return Number.isInteger(id) && id > 0 ? id : null;
};
