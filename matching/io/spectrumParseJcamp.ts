import { convert } from 'jcampconverter';
import { SpectrumMixtureSchema, type SpectrumMixture } from '../../shared/mixture';
import type { Nucleus } from '../../shared/nucleus';
import { InputError } from './InputError';
import { JCAMP_SOLVENT_NAMES, XI_13C } from './jcampHeaderMeta';
import { mixtureMetaParse, type MixtureMeta } from './mixtureMetaParse';

function text(v: unknown): string | undefined {
  if (v === undefined || v === null) return undefined;
  return String(Array.isArray(v) ? v[0] : v).trim();
}

/**
 * Reads a 1D NMR spectrum from JCAMP-DX text with jcampconverter. X in Hz is turned into ppm with
 * .OBSERVE FREQUENCY; X in PPM is taken as is. Nucleus, solvent and frequency come from the file
 * (.OBSERVE NUCLEUS, .SOLVENT NAME) unless meta says otherwise.
 */
export function spectrumParseJcamp(jcamp: string, meta: MixtureMeta = {}): SpectrumMixture {
  if (typeof jcamp !== 'string') throw new TypeError('JCAMP-DX text must be a string');
  const { meta: m, issues } = mixtureMetaParse(meta);
  if (issues.length > 0) throw new InputError('spectrum metadata', issues);
  if (!jcamp.trimStart().startsWith('##')) throw new InputError('JCAMP-DX', [{ line: 1, message: 'not a JCAMP-DX file: it must start with a ##LABEL= line such as ##TITLE=' }]);
  let parsed: ReturnType<typeof convert>;
  try {
    parsed = convert(jcamp, { keepRecordsRegExp: /^(\.|\$|TITLE$|XUNITS$|YUNITS$|XYPOINTS$|XFACTOR$|YFACTOR$)/ });
  } catch (e) {
    throw new InputError('JCAMP-DX', [{ message: `cannot read the file: ${(e as Error).message}` }]);
  }
  const block = parsed.flatten[0];
  if (!block) throw new InputError('JCAMP-DX', [{ message: 'the file holds no data block' }]);
  if (block.ntuples && Object.keys(block.ntuples).length > 0 && (block.spectra?.length ?? 0) > 1) {
    throw new InputError('JCAMP-DX', [{ field: 'NTUPLES', message: '2D / multi-page JCAMP-DX is not supported; export a 1D spectrum' }]);
  }
  const info = block.info as Record<string, unknown>;
  const userLabels = (block.meta ?? {}) as Record<string, unknown>;
  // jcampconverter reads XYDATA and PEAK TABLE; an uneven axis written as XYPOINTS is read here.
  const spectrum = block.spectra?.[0] ?? xyPointsRead(info);
  const data = spectrum?.data as { x?: ArrayLike<number>; y?: ArrayLike<number> } | undefined;
  if (!spectrum || !data?.x || !data?.y || data.x.length < 5) {
    throw new InputError('JCAMP-DX', [{ field: 'XYDATA', message: 'no spectrum data (XYDATA or XYPOINTS with at least 5 points) found' }]);
  }
  const nucleusText = text(info['.OBSERVENUCLEUS'])?.replace(/^\^/, '');
  let nucleus: Nucleus | undefined = m.nucleus;
  if (nucleus === undefined) {
    if (nucleusText === undefined || nucleusText === '1H') nucleus = '1H';
    else if (nucleusText === '13C') nucleus = '13C';
    else throw new InputError('JCAMP-DX', [{ field: '.OBSERVE NUCLEUS', message: `nucleus "${nucleusText}" is not supported (1H or 13C)` }]);
  }
  const observe = Number(spectrum.observeFrequency ?? info['.OBSERVEFREQUENCY']);
  const fileMhz = Number(text(userLabels['TESSERA SPECTROMETER MHZ']));
  const mhz = m.mhz ?? (Number.isFinite(fileMhz) && fileMhz > 0 ? fileMhz : observe > 0 ? (nucleus === '13C' ? observe / XI_13C : observe) : undefined);
  if (mhz === undefined) throw new InputError('JCAMP-DX', [{ field: '.OBSERVE FREQUENCY', message: 'spectrometer frequency is missing (no .OBSERVE FREQUENCY); give it as mhz' }]);
  const xUnits = String(spectrum.xUnits ?? info.XUNITS ?? '').toUpperCase();
  let toPpm: (v: number) => number;
  if (xUnits === 'PPM') toPpm = (v) => v;
  else if (xUnits === 'HZ') {
    if (!(observe > 0)) throw new InputError('JCAMP-DX', [{ field: '.OBSERVE FREQUENCY', message: 'X is in Hz but .OBSERVE FREQUENCY is missing' }]);
    toPpm = (v) => v / observe;
  } else throw new InputError('JCAMP-DX', [{ field: 'XUNITS', message: `X units "${xUnits}" are not supported (PPM or HZ)` }]);
  const solventText = text(info['.SOLVENTNAME']);
  const solvent = m.solvent ?? JCAMP_SOLVENT_NAMES.find(([re]) => solventText !== undefined && re.test(solventText))?.[1] ?? 'other';
  const refText = text(userLabels['TESSERA REFERENCE']);
  const reference = m.reference ?? (refText === 'TMS' || refText === 'DSS' || refText === 'TSP' || refText === 'none' ? refText : undefined);
  const demo = m.demo ?? (text(userLabels['TESSERA DEMO']) === 'true' ? true : undefined);
  const out = SpectrumMixtureSchema.safeParse({
    ...m,
    kind: 'spectrum',
    name: m.name ?? (block.title ? String(block.title) : undefined),
    nucleus,
    mhz,
    solvent,
    ...(reference ? { reference } : {}),
    ...(demo !== undefined ? { demo } : {}),
    ppm: Array.from(data.x, toPpm),
    intensity: Array.from(data.y),
  });
  if (!out.success) throw new InputError('JCAMP-DX', out.error.issues.map((i) => ({ field: i.path.join('.'), message: i.message })));
  return out.data;
}

/** XYPOINTS=(XY..XY): "x, y" pairs (AFFN), scaled by XFACTOR/YFACTOR; null when absent or unreadable. */
function xyPointsRead(info: Record<string, unknown>): { data: { x: number[]; y: number[] }; xUnits?: string; observeFrequency?: number } | null {
  const raw = info.XYPOINTS;
  if (typeof raw !== 'string') return null;
  const xf = Number(info.XFACTOR ?? 1) || 1;
  const yf = Number(info.YFACTOR ?? 1) || 1;
  const x: number[] = [];
  const y: number[] = [];
  for (const line of raw.split(/\r?\n/).slice(1)) {
    const t = line.replace(/\$\$.*$/, '').trim();
    if (t === '') continue;
    const pairs = t.split(/;/);
    for (const pair of pairs) {
      const [a, b] = pair.split(/[,\s]+/).filter(Boolean).map(Number);
      if (!Number.isFinite(a) || !Number.isFinite(b)) return null;
      x.push(a * xf);
      y.push(b * yf);
    }
  }
  return { data: { x, y }, xUnits: typeof info.XUNITS === 'string' ? info.XUNITS : undefined };
}
