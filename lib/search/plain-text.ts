/**
 * Members' Markdown (with $…$ formulas) as the words a reader sees once it is rendered:
 * for search snippets and e-mail quotes, which show text, never markup. Emphasis marks,
 * list dashes, heading hashes, quote marks, link targets and code fences go; a formula
 * becomes its plain reading (\frac{L}{D} → L/D, \times → ×, Greek letters as letters).
 */
import 'server-only';

const TEX_SYMBOLS: Record<string, string> = {
  times: '×',
  cdot: '·',
  approx: '≈',
  le: '≤',
  leq: '≤',
  ge: '≥',
  geq: '≥',
  ne: '≠',
  pm: '±',
  to: '→',
  rightarrow: '→',
  sum: 'Σ',
  Sigma: 'Σ',
  Delta: 'Δ',
  delta: 'δ',
  alpha: 'α',
  beta: 'β',
  gamma: 'γ',
  eta: 'η',
  lambda: 'λ',
  mu: 'μ',
  nu: 'ν',
  pi: 'π',
  rho: 'ρ',
  sigma: 'σ',
  tau: 'τ',
  varepsilon: 'ε',
  epsilon: 'ε',
  theta: 'θ',
  omega: 'ω',
  infty: '∞',
  circ: '°',
  degree: '°',
};

/**
 * A TeX formula as plain text.
 * @example
 * texToPlain('h_f = f\\,\\frac{L}{D}\\,\\frac{v^2}{2g}')  // → 'hf = f L/D v²/2g'
 */
export function texToPlain(tex: string): string {
  let s = tex;
  // innermost first, so nested fractions and roots unwrap step by step
  for (let i = 0; i < 6; i++) {
    const before = s;
    s = s
      .replace(/\\[dt]?frac\s*\{([^{}]*)\}\s*\{([^{}]*)\}/g, (_, a: string, b: string) => ` ${wrap(a)}/${wrap(b)} `)
      .replace(/\\sqrt\s*\{([^{}]*)\}/g, '√($1)')
      .replace(/\\(?:text|mathrm|mathit|mathbf|operatorname|textrm)\s*\{([^{}]*)\}/g, '$1')
      .replace(/\^\{([^{}]*)\}/g, (_, a: string) => sup(a))
      .replace(/_\{([^{}]*)\}/g, '$1')
      .replace(/\\(?:left|right|big|Big|bigg|Bigg)\s*([()[\]|.]|\\[{}])/g, (_, d: string) =>
        d === '.' ? '' : d.replace('\\', ''),
      );
    if (s === before) break;
  }
  return s
    .replace(/\^(\w)/g, (_, a: string) => sup(a))
    .replace(/_(\w)/g, '$1')
    .replace(/\\([A-Za-z]+)/g, (_, name: string) => TEX_SYMBOLS[name] ?? '')
    .replace(/\\[,;:! ]/g, ' ')
    .replace(/\\\\/g, ' ')
    .replace(/[{}]/g, '')
    .replace(/\s+/g, ' ')
    .trim();
}

const SUPERSCRIPTS: Record<string, string> = {
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
  '-': '⁻',
  '.': '·',
};
const sup = (a: string) =>
  [...a].every((c) => c in SUPERSCRIPTS) ? [...a].map((c) => SUPERSCRIPTS[c]).join('') : `^(${a})`;
const wrap = (a: string) => (/^[\w.²³^]+$/.test(a.trim()) ? a.trim() : `(${a.trim()})`);

/**
 * Markdown as the words it renders to: one line per paragraph or list item.
 * @example
 * markdownToPlain('**Check** the _waste valve_:\n\n- one\n- two')  // → 'Check the waste valve:\none\ntwo'
 */
export function markdownToPlain(md: string): string {
  return (
    md
      .replace(/\r\n?/g, '\n')
      // fenced code keeps its words, loses its fences
      .replace(/^\s*(```|~~~).*$/gm, '')
      .replace(/\$\$([\s\S]+?)\$\$/g, (_, t: string) => ` ${texToPlain(t)} `)
      .replace(/(?<![\\$])\$(?!\s)([^$\n]+?)(?<!\s)\$(?!\d)/g, (_, t: string) => texToPlain(t))
      .replace(/\\\(([\s\S]+?)\\\)/g, (_, t: string) => texToPlain(t))
      .replace(/!\[([^\]]*)\]\([^)]*\)/g, '$1')
      .replace(/\[([^\]]*)\]\([^)]*\)/g, '$1')
      .replace(/<(https?:[^>\s]+)>/g, '$1')
      .replace(/<\/?[A-Za-z][^>]*>/g, ' ')
      .replace(/^\s{0,3}#{1,6}\s+/gm, '')
      .replace(/^\s{0,3}>\s?/gm, '')
      .replace(/^\s*(?:[-*+]|\d+[.)])\s+(?:\[[ xX]\]\s+)?/gm, '')
      .replace(/^\s*(?:-{3,}|\*{3,}|_{3,})\s*$/gm, '')
      .replace(/^\s*\|?(?:\s*:?-{3,}:?\s*\|)+\s*:?-*:?\s*$/gm, '')
      .replace(/\|/g, ' ')
      .replace(/(\*\*|__)(?=\S)([\s\S]*?\S)\1/g, '$2')
      .replace(/(?<![\w*])([*_])(?=\S)([^*_\n]*?\S)\1(?![\w*])/g, '$2')
      .replace(/~~(?=\S)([\s\S]*?\S)~~/g, '$1')
      .replace(/`+([^`]*)`+/g, '$1')
      .replace(/\\([\\`*_{}[\]()#+\-.!>|~])/g, '$1')
      .replace(/[ \t]+/g, ' ')
      .replace(/ *\n */g, '\n')
      .replace(/\n{2,}/g, '\n')
      .trim()
  );
}
