/**
 * Every field path in a form's values, the way react-hook-form and the server's field issues
 * name them: `data.code`, `data.points`, `data.points.0.volumeUl`, `reason`. Objects and arrays
 * are listed themselves too, since a whole-group rule (e.g. "every calibration volume…") names them.
 */
export function formFieldPaths(values: unknown, prefix = ''): string[] {
  if (values === null || typeof values !== 'object') return prefix ? [prefix] : [];
  const entries = Array.isArray(values)
    ? values.map((value, index) => [String(index), value] as const)
    : Object.entries(values);
  const nested = entries.flatMap(([key, value]) => formFieldPaths(value, prefix ? `${prefix}.${key}` : key));
  return prefix ? [prefix, ...nested] : nested;
}
