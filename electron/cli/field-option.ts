/**
 * A refused operation input names its field in words ("The temperature (K) must be positive"); on the command
 * line the user also needs to know which option to change. This appends the option whose name matches the
 * field ("--temperature-k" for conditions.temperatureK), or the input field's path when no option matches.
 */
const normalise = (name: string): string => name.replace(/[-_]/g, '').toLowerCase();

export function optionForField(field: string | undefined, optionNames: readonly string[]): string {
  if (field === undefined || field === '') return '';
  const keys = field.split('.').filter((key) => !/^\d+$/.test(key));
  const last = keys[keys.length - 1];
  const option = last === undefined ? undefined : optionNames.find((name) => normalise(name) === normalise(last));
  return option === undefined ? ` (input field ${field})` : ` (option --${option})`;
}
