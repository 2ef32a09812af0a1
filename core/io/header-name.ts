import type { DeformationMode } from '../data/types';
import type { ColumnRole } from './types';

/** What a column name (header without unit) says: its role and, for G/E/J/D symbols, the mode. */
export interface RecognisedName {
  role: ColumnRole;
  deformation?: DeformationMode;
}

type Rule = [RegExp, ColumnRole, DeformationMode?];

/** Symbols, lower case, primes unified to ' (see normaliseName). */
const SYMBOLS: Rule[] = [
  [/^g(?:'|_?p|_?prime)$/, 'storageModulus', 'shear'],
  [/^e(?:'|_?p|_?prime)$/, 'storageModulus', 'tension'],
  [/^g(?:''|_?pp|_?d(?:ouble_?)?prime)$/, 'lossModulus', 'shear'],
  [/^e(?:''|_?pp|_?d(?:ouble_?)?prime)$/, 'lossModulus', 'tension'],
  [/^\|?g\s?\*\|?$|^g_?star$/, 'complexModulus', 'shear'],
  [/^\|?e\s?\*\|?$|^e_?star$/, 'complexModulus', 'tension'],
  [/^\|?(?:η|eta)\s?\*?\|?$|^eta_?star$/, 'complexViscosity'],
  [/^tan\s?(?:\(\s?(?:δ|delta|d)\s?\)|_?(?:δ|delta|d))?$/, 'tanDelta'],
  [/^(?:δ|delta|phase)$/, 'phaseAngle'],
  [/^g\s?\(t\)$|^g_t$/, 'relaxationModulus', 'shear'],
  [/^e\s?\(t\)$|^e_t$/, 'relaxationModulus', 'tension'],
  [/^j\s?\(t\)$|^j_t$/, 'creepCompliance', 'shear'],
  [/^d\s?\(t\)$|^d_t$/, 'creepCompliance', 'tension'],
  [/^(?:ω|omega|w)$/, 'angularFrequency'],
  [/^(?:f|freq)$/, 'frequency'],
  [/^(?:temp|θ)$/, 'temperature'],
];

/** Words and phrases, lower case. */
const PHRASES: Rule[] = [
  [/^(?:storage(?: modulus)?|elastic modulus)$/, 'storageModulus'],
  [/^(?:loss modulus|viscous modulus)$/, 'lossModulus'],
  [
    /^(?:complex modulus(?: magnitude)?|magnitude of complex modulus|dynamic modulus)$/,
    'complexModulus',
  ],
  [/^complex viscosity(?: magnitude)?$/, 'complexViscosity'],
  [
    /^(?:loss factor|loss tangent|damping(?: factor)?|tan(?:gent)? delta|dissipation factor)$/,
    'tanDelta',
  ],
  [/^(?:phase(?: angle| shift| lag)?|loss angle|delta)$/, 'phaseAngle'],
  [/^(?:(?:stress )?relaxation(?: modulus)?)$/, 'relaxationModulus'],
  [/^(?:creep )?compliance$/, 'creepCompliance'],
  [
    /^(?:temperature|temp\.?|(?:sample|measured|set|actual|oven|test) temp(?:\.|erature)?|temperature set ?point)$/,
    'temperature',
  ],
  [/^(?:time|(?:step|elapsed|test|creep|relaxation|total) time)$/, 'time'],
  [/^(?:(?:oscillation |osc\.? |test )?frequency|freq\.)$/, 'frequency'],
  [/^(?:ang(?:ular|\.)? ?freq(?:uency|\.)?|circular frequency)$/, 'angularFrequency'],
  // German and French words found in instrument exports.
  [/^(?:temperatur|température|temperature de l'essai)$/, 'temperature'],
  [/^(?:zeit|temps|prüfzeit)$/, 'time'],
  [/^(?:frequenz|fréquence)$/, 'frequency'],
  [/^(?:kreisfrequenz|winkelfrequenz|fréquence angulaire|pulsation)$/, 'angularFrequency'],
  [/^(?:speichermodul|module de conservation|module élastique)$/, 'storageModulus'],
  [/^(?:verlustmodul|module de perte)$/, 'lossModulus'],
  [/^(?:verlustfaktor|facteur de perte)$/, 'tanDelta'],
  [/^(?:phasenwinkel|verlustwinkel|angle de phase|angle de perte)$/, 'phaseAngle'],
  [/^(?:komplexer (?:schub)?modul|module complexe)$/, 'complexModulus'],
  [/^(?:komplexe viskosität|viscosité complexe)$/, 'complexViscosity'],
  [/^(?:relaxationsmodul|module de relaxation)$/, 'relaxationModulus'],
  [/^(?:kriechnachgiebigkeit|nachgiebigkeit|complaisance(?: de fluage)?)$/, 'creepCompliance'],
];

const MODE_WORDS: [RegExp, DeformationMode][] = [
  [/^(?:shear|torsion(?:al)?)\s+/, 'shear'],
  [/^(?:tensile|tension|flexural|bending|young'?s)\s+/, 'tension'],
];

/** Lower case, primes and quotes unified (′ ’ → ', ″ " → ''), spaces collapsed. */
export function normaliseName(name: string): string {
  return name
    .trim()
    .toLowerCase()
    .replace(/[′’‘´`]/g, "'")
    .replace(/[″"“”]/g, "''")
    .replace(/\s+(['*])/g, '$1')
    .replace(/\|\s+(?=\S*\*)/g, '|')
    .replace(/(\*)\s+\|/g, '$1|')
    .replace(/\s+/g, ' ')
    .replace(/[:.]$/, '')
    .trim();
}

function match(rules: Rule[], n: string): RecognisedName | undefined {
  for (const [re, role, deformation] of rules) {
    if (re.test(n)) return deformation ? { role, deformation } : { role };
  }
  return undefined;
}

function single(n: string): RecognisedName | undefined {
  return match(SYMBOLS, n) ?? match(PHRASES, n);
}

/**
 * Recognises a column name without its unit: "G'", "E''", "tan δ", "Storage modulus",
 * "Storage modulus E'", "shear loss modulus", "|η*|", "G(t)", "J(t)", "ω", "Frequency" …
 * Single letters are case-sensitive: "T" is temperature, "t" is time.
 */
export function recogniseName(name: string): RecognisedName | undefined {
  const raw = name.trim();
  if (raw.length === 0 || raw.length > 80) return undefined;
  if (raw === 'T') return { role: 'temperature' };
  if (raw === 't') return { role: 'time' };
  let n = normaliseName(raw);
  let modeWord: DeformationMode | undefined;
  for (const [re, mode] of MODE_WORDS) {
    if (re.test(n)) {
      modeWord = mode;
      n = n.replace(re, '');
    }
  }
  let found = single(n);
  if (!found) {
    // "Storage modulus E'" or "G' storage modulus": both parts must say the same thing.
    const words = n.split(' ');
    for (let i = 1; i < words.length && !found; i++) {
      const a = single(words.slice(0, i).join(' '));
      const b = single(words.slice(i).join(' '));
      // "Temperature T", "Time t": a bare t/T agrees with a temperature or time phrase.
      const tLetter = (w: string[]) => w.length === 1 && w[0] === 't';
      if (a && (a.role === 'temperature' || a.role === 'time') && tLetter(words.slice(i)))
        found = a;
      else if (a && b && a.role === b.role) {
        found = { role: a.role, deformation: a.deformation ?? b.deformation };
      }
    }
  }
  if (!found) return undefined;
  const deformation = found.deformation ?? modeWord;
  return deformation ? { role: found.role, deformation } : { role: found.role };
}
