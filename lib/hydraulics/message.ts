/**
 * Messages that carry quantities: the words, and each number as its kind and SI value,
 * so whoever shows the message can write the numbers in the reader's units. The engine
 * writes them with {@link say}; the plain `message` beside them is the SI (metric)
 * reading, for logs and for callers that have no reader.
 */
import { readableDisplay, type QuantityKind } from './units';

export interface MessageQuantity {
  kind: QuantityKind;
  /** the value in the kind's SI unit (m, m³/s, Pa, …) */
  si: number;
}

/** A message as words and quantities in order. */
export type MessagePart = string | MessageQuantity;

/**
 * A quantity inside a message.
 * @example
 * qty('length', 1.2192)  // → { kind: 'length', si: 1.2192 }
 */
export function qty(kind: QuantityKind, si: number): MessageQuantity {
  return { kind, si };
}

function isQuantity(x: unknown): x is MessageQuantity {
  return typeof x === 'object' && x !== null && 'kind' in x && 'si' in x;
}

/**
 * A tagged template for messages: quantities stay apart, a nested message (another
 * `say`) is spliced in, anything else becomes text.
 * @example
 * say`A fall of ${qty('length', 0.5)} is short.`  // → ['A fall of ', { kind: 'length', si: 0.5 }, ' is short.']
 * say`Only ${3} trials.`  // → ['Only 3 trials.']
 * say`Loss ${say`of ${qty('length', 2)}`}.`  // → ['Loss of ', { kind: 'length', si: 2 }, '.']
 */
export function say(strings: TemplateStringsArray, ...values: unknown[]): MessagePart[] {
  const parts: MessagePart[] = [];
  const push = (p: MessagePart) => {
    const last = parts[parts.length - 1];
    if (typeof p === 'string' && typeof last === 'string') parts[parts.length - 1] = last + p;
    else if (p !== '') parts.push(p);
  };
  strings.forEach((s, i) => {
    push(s);
    if (i < values.length) {
      const v = values[i];
      if (Array.isArray(v)) (v as unknown[]).forEach((x) => push(isQuantity(x) ? x : String(x)));
      else push(isQuantity(v) ? v : String(v));
    }
  });
  return parts;
}

/**
 * Writes a message with each quantity given by `format`.
 * @example
 * renderMessage(['Lift ', qty('length', 8.8392), '.'], (k, si) => `${si.toFixed(1)} m`)  // → 'Lift 8.8 m.'
 */
export function renderMessage(
  parts: readonly MessagePart[],
  format: (kind: QuantityKind, si: number) => string,
): string {
  return parts.map((p) => (typeof p === 'string' ? p : format(p.kind, p.si))).join('');
}

const sig3 = new Intl.NumberFormat('en', { maximumSignificantDigits: 3 });

/**
 * A quantity in metric units chosen by size, three figures, never e-notation: the
 * engine's own reading of a message, where no reader's units are known.
 * @example
 * metricText('length', 1.2192)  // → '1.22 m'
 * metricText('pressure', 551580)  // → '552 kPa'
 * metricText('smallFlow', 1e-6)  // → '3.6 L/h'
 */
export function metricText(kind: QuantityKind, si: number): string {
  const d = readableDisplay(kind, si, 'metric');
  const v = Number.isFinite(d.value) ? sig3.format(d.value) : '—';
  return d.label ? `${v} ${d.label}` : v;
}

/**
 * A message as an input issue's two forms: the SI reading and its parts.
 * @example
 * said(['at most ', qty('length', 100)])  // → { message: 'at most 100 m', parts: ['at most ', { kind: 'length', si: 100 }] }
 */
export function said(parts: MessagePart[]): { message: string; parts: MessagePart[] } {
  return { message: renderMessage(parts, metricText), parts };
}
