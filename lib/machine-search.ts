// Words and addresses shared by the lists of machines (the reports catalogue, a seller's machines).

const COUNT = new Intl.NumberFormat('en-GB');

/** "7 machines", or "25–48 of 10,015 machines" once there is more than a page. */
export function machineCountText(first: number, shown: number, total: number, pageSize: number) {
  if (total <= pageSize) return `${COUNT.format(total)} ${total === 1 ? 'machine' : 'machines'}`;
  return `${COUNT.format(first)}–${COUNT.format(first + shown - 1)} of ${COUNT.format(total)} machines`;
}

/** "Page 2 of 418". */
export function pageCountText(page: number, total: number, pageSize: number) {
  return `Page ${COUNT.format(page)} of ${COUNT.format(Math.max(1, Math.ceil(total / pageSize)))}`;
}

/** The address of a list of machines for a search and page; the defaults are left out. */
export function machineSearchHref(path: string, q: string | undefined, page: number) {
  const params = new URLSearchParams();
  if (q) params.set('q', q);
  if (page > 1) params.set('page', String(page));
  const query = params.toString();
  return query ? `${path}?${query}` : path;
}
