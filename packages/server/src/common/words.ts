import { DESIGN_STATE_LABELS, MOUNT_TYPE_LABELS, fieldName, fieldWords, identifiersIn } from '@tacet/vibration';

/** Codes people may meet in a message, in the glossary's words. */
const CODE_WORDS: Record<string, string> = {
  ...Object.fromEntries(Object.entries(MOUNT_TYPE_LABELS).map(([code, label]) => [code, label.toLowerCase()])),
  ...Object.fromEntries(Object.entries(DESIGN_STATE_LABELS).map(([code, label]) => [code, label.toLowerCase()])),
};

/** Wordings of class-validator's own phrases that read like code. */
const PHRASES: Array<[RegExp, string]> = [
  [/ must be a number conforming to the specified constraints/, ' must be a number'],
  [/ must be an integer number/, ' must be a whole number'],
  [/ must be a string/, ' must be text'],
  [/ must be a boolean value/, ' must be true or false'],
  [/ must be shorter than or equal to (\d+) characters/, ' must be at most $1 characters long'],
  [/ must be longer than or equal to (\d+) characters/, ' must be at least $1 characters long'],
  [/ must contain no more than 1 elements/, ' must have at most one item'],
  [/ must contain at least 1 elements/, ' must have at least one item'],
  [/ must contain no more than (\d+) elements/, ' must have at most $1 items'],
  [/ must contain at least (\d+) elements/, ' must have at least $1 items'],
  [/ must not be greater than /, ' must be at most '],
  [/ must not be less than /, ' must be at least '],
  [/ must be an array/, ' must be a list'],
];

/** A snake-case code or a camel-case name inside a message, in words. */
function codeInWords(token: string): string {
  if (token in CODE_WORDS) return CODE_WORDS[token];
  if (token.includes('_')) return token.replace(/_/g, ' ');
  return fieldWords(token).toLowerCase();
}

const sentenceCase = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/**
 * A message for people from one that may name fields and codes: the property at its start
 * becomes the glossary's name for it (`massKg must be a positive number` → "Mass must be a
 * positive number"), code-like phrases become words, and any identifier left (`minUtilization`,
 * `open_spring`) is read out. `path` is the field path the message is about, when there is one.
 */
export function messageInWords(message: string, path?: string): string {
  let text = message;
  const unknown = /^property (\S+) should not exist$/.exec(text);
  if (unknown) return `${fieldWords(unknown[1])} is not expected here`;
  text = text.replace(
    /^each value in nested property (\S+) must be either object or array$/,
    (_m, p: string) => `Each item of ${fieldWords(p).toLowerCase()} must be an object`,
  );
  text = text.replace(
    /^nested property (\S+) must be either object or array$/,
    (_m, p: string) => `${fieldWords(p)} must be an object or a list`,
  );
  if (path) {
    const property =
      path
        .split(/[.[\]]/)
        .filter(Boolean)
        .pop() ?? '';
    const name = fieldName(path);
    if (property && text.startsWith(`${property} `)) text = `${name}${text.slice(property.length)}`;
    else if (path && text.startsWith(`${path} `)) text = `${name}${text.slice(path.length)}`;
    text = text.replace(
      new RegExp(`^each value in ${property.replace(/[$^*+?.()|\\[\]{}]/g, '\\$&')} `),
      `Each value in ${name.toLowerCase()} `,
    );
  }
  for (const [pattern, replacement] of PHRASES) text = text.replace(pattern, replacement);
  text = text.replace(
    /(one of the following values: )(.*)$/,
    (_m, lead: string, list: string) =>
      `${lead.replace('one of the following values: ', 'one of: ')}${list
        .split(/,\s*/)
        .map((value) => codeInWords(value))
        .join(', ')}`,
  );
  const flagged = new Set(identifiersIn(text));
  text = text.replace(/\b[a-z]+(?:[A-Z][a-z0-9]*)+\b|\b[a-z][a-z0-9]*(?:_[a-z0-9]+)+\b/g, (token) =>
    flagged.has(token) ? codeInWords(token) : token,
  );
  return sentenceCase(text);
}
