/**
 * What a log curve measures, guessed from its mnemonic and unit. The mnemonic lists are common practice,
 * no source: logging contractors name curves their own way, so the user always confirms the guess.
 */
export type CurveRole = 'sonic' | 'resistivity' | 'density' | 'gamma' | 'caliper' | 'neutron' | 'porosity' | 'other';

interface RoleRule {
  role: CurveRole;
  exact: string[];
  patterns: RegExp[];
}

// Order matters: shear sonic and the density correction are checked before the broad patterns catch them.
const RULES: RoleRule[] = [
  // Shear slowness and density correction are not inputs to a compressional-sonic or density method.
  { role: 'other', exact: ['DTS', 'DTSM', 'DTSH', 'DTSHEAR', 'DT2', 'DRHO', 'DCOR', 'HDRA', 'PEF', 'PE', 'SP', 'BS', 'BIT'], patterns: [] },
  {
    role: 'sonic',
    exact: ['DT', 'DTC', 'DTCO', 'DTP', 'DT4P', 'DTCOMP', 'AC', 'ACC', 'SONIC', 'SON', 'DELT', 'DTL', 'DTLN', 'DTLF'],
    patterns: [/^DT\d*$/, /^DTC\d*$/, /^AC\d*$/],
  },
  {
    role: 'resistivity',
    exact: [
      'RES',
      'RT',
      'RD',
      'RM',
      'RS',
      'ILD',
      'ILM',
      'IL',
      'LLD',
      'LLS',
      'LL8',
      'RDEP',
      'RMED',
      'RSHA',
      'RDEEP',
      'RILD',
      'RILM',
      'SFL',
      'SFLU',
      'SFLA',
      'MSFL',
      'RXO',
      'RXOZ',
      'LN',
      'SN',
      'HDRS',
      'HMRS',
      'RLA5',
      'RLA3',
      'RPCEHM',
      'RACEHM',
    ],
    patterns: [/^AT\d0$/, /^AHT\d0$/, /^AO\d0$/, /^AF\d0$/, /^M2R\d$/, /^RLA\d$/, /^RES/],
  },
  { role: 'density', exact: ['RHOB', 'RHOZ', 'RHO8', 'DEN', 'DENS', 'ZDEN', 'ZDNC', 'RHOM', 'BDEL', 'BDCFM'], patterns: [/^RHOB/, /^DEN/] },
  {
    role: 'gamma',
    exact: ['GR', 'SGR', 'CGR', 'GRC', 'GRD', 'GRS', 'HSGR', 'HCGR', 'ECGR', 'GAM', 'GAMMA', 'GRGC', 'GRR', 'GR_EDTC'],
    patterns: [/^GR/, /^SGR/],
  },
  {
    role: 'caliper',
    exact: ['CALI', 'CAL', 'CALX', 'CALY', 'CALS', 'HCAL', 'C1', 'C2', 'DCAL', 'LCAL', 'CALIPER'],
    patterns: [/^CAL/, /^HCAL/],
  },
  {
    role: 'neutron',
    exact: ['NPHI', 'TNPH', 'NPOR', 'NPHS', 'NPLS', 'NPSS', 'CNC', 'CNCF', 'CNCS', 'NEU', 'NEUT', 'NPL', 'HNPO', 'APLC', 'NPHZ'],
    patterns: [/^NPHI/, /^TNPH/],
  },
  {
    role: 'porosity',
    exact: ['PHI', 'PHIE', 'PHIT', 'POR', 'PORE', 'PORT', 'DPHI', 'SPHI', 'DPHZ', 'DPOR', 'SPOR', 'PHID', 'PHIS', 'PHIN'],
    patterns: [/^PHI/],
  },
];

/** Unit spellings, upper case with spaces removed and µ written u, that identify a measurement when the mnemonic does not. */
const UNIT_ROLES: [CurveRole, string[]][] = [
  ['sonic', ['US/FT', 'USEC/FT', 'US/F', 'US/M', 'USEC/M']],
  ['resistivity', ['OHMM', 'OHM.M', 'OHM-M', 'OHMS', 'OHM']],
  ['density', ['G/CC', 'G/CM3', 'G/C3', 'KG/M3', 'K/M3', 'GM/CC']],
  ['gamma', ['GAPI', 'API']],
];

/**
 * A first guess at a curve's role for the import mapping. Mnemonics are compared upper case, with a
 * duplicate suffix (":2") dropped; the unit decides only when the mnemonic is unknown.
 *
 * @example
 * suggestCurveRole('DTCO', 'us/ft'); // → 'sonic'
 * suggestCurveRole('AT90', 'OHMM');  // → 'resistivity'
 * suggestCurveRole('XYZ', 'G/CC');   // → 'density'
 */
export function suggestCurveRole(mnemonic: string, unit: string): CurveRole {
  const name = mnemonic.trim().toUpperCase().replace(/:\d+$/, '');
  for (const rule of RULES) if (rule.exact.includes(name)) return rule.role;
  for (const rule of RULES) if (rule.patterns.some((p) => p.test(name))) return rule.role;
  const u = unit
    .trim()
    .replace(/[\u00b5\u03bc]/g, 'u')
    .toUpperCase()
    .replace(/\s+/g, '');
  for (const [role, units] of UNIT_ROLES) if (units.includes(u)) return role;
  return 'other';
}
