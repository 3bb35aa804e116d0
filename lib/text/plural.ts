const rules = new Intl.PluralRules('en');

/** "1 template", "2 templates", "0 templates": the count with the English form that fits it. */
export function countOf(count: number, singular: string, plural = `${singular}s`): string {
  return `${count.toLocaleString('en')} ${rules.select(count) === 'one' ? singular : plural}`;
}

/** "1 row matches", "2 rows match": a count with its noun and a verb that agrees. */
export function countWithVerb(count: number, noun: [string, string], verb: [string, string]): string {
  const one = rules.select(count) === 'one';
  return `${count.toLocaleString('en')} ${one ? noun[0] : noun[1]} ${one ? verb[0] : verb[1]}`;
}
