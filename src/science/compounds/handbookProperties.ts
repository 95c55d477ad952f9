// Properties that the project's reference tables do not carry. EVERY value in this file is
// recalled (from memory) from handbook and safety-data-sheet figures of the usual kind
// (CRC Handbook, supplier SDS), not looked up: treat each as approximate and check the
// supplier's safety data sheet before relying on a flash or autoignition point.
// Densities: liquid at 20 degC, g/mL. n_D: sodium D line at 20 degC. Flash point: closed cup.
// Hazard flags: peroxide former (lab peroxide-former lists, e.g. Kelly, Chem. Health Saf. 1996,
// from memory), carcinogen (IARC group 1, 2A or 2B, from memory), toxic (acute or chronic
// toxicity beyond ordinary solvent exposure, from memory).

/** One compound's recalled properties. Temperatures in degC here; the library converts to K. */
export interface HandbookEntry {
  name: string;
  synonyms: string[];
  formula: string;
  densityGPerMl: number;
  refractiveIndexD20: number;
  flashPointC: number | null;
  autoignitionC: number | null;
  peroxideFormer?: boolean;
  carcinogen?: string;
  toxic?: boolean;
  notes?: string[];
}

/** By CAS number. (from memory) */
export const handbookProperties: Readonly<Record<string, HandbookEntry>> = {
  '67-64-1': { name: 'acetone', synonyms: ['propanone', '2-propanone', 'dimethyl ketone'], formula: 'C3H6O', densityGPerMl: 0.790, refractiveIndexD20: 1.3588, flashPointC: -20, autoignitionC: 465 },
  '67-56-1': { name: 'methanol', synonyms: ['methyl alcohol', 'MeOH', 'wood alcohol'], formula: 'CH4O', densityGPerMl: 0.7914, refractiveIndexD20: 1.3288, flashPointC: 11, autoignitionC: 464, toxic: true },
  '64-17-5': { name: 'ethanol', synonyms: ['ethyl alcohol', 'EtOH', 'alcohol'], formula: 'C2H6O', densityGPerMl: 0.7893, refractiveIndexD20: 1.3611, flashPointC: 13, autoignitionC: 363 },
  '71-23-8': { name: '1-propanol', synonyms: ['n-propanol', 'propan-1-ol', 'propyl alcohol', 'n-propyl alcohol'], formula: 'C3H8O', densityGPerMl: 0.8035, refractiveIndexD20: 1.3850, flashPointC: 15, autoignitionC: 371 },
  '67-63-0': { name: '2-propanol', synonyms: ['isopropanol', 'propan-2-ol', 'isopropyl alcohol', 'IPA'], formula: 'C3H8O', densityGPerMl: 0.786, refractiveIndexD20: 1.3776, flashPointC: 12, autoignitionC: 399, peroxideFormer: true, notes: ['listed among peroxide formers that concentrate on distillation in some lab guides'] },
  '71-36-3': { name: '1-butanol', synonyms: ['n-butanol', 'butan-1-ol', 'butyl alcohol', 'n-butyl alcohol'], formula: 'C4H10O', densityGPerMl: 0.8098, refractiveIndexD20: 1.3993, flashPointC: 35, autoignitionC: 343 },
  '7732-18-5': { name: 'water', synonyms: ['H2O', 'distilled water'], formula: 'H2O', densityGPerMl: 0.9982, refractiveIndexD20: 1.3330, flashPointC: null, autoignitionC: null },
  '109-66-0': { name: 'n-pentane', synonyms: ['pentane'], formula: 'C5H12', densityGPerMl: 0.6262, refractiveIndexD20: 1.3575, flashPointC: -49, autoignitionC: 260 },
  '110-54-3': { name: 'n-hexane', synonyms: ['hexane', 'hexanes'], formula: 'C6H14', densityGPerMl: 0.659, refractiveIndexD20: 1.3749, flashPointC: -22, autoignitionC: 225, toxic: true, notes: ['nerve damage with long exposure'] },
  '142-82-5': { name: 'n-heptane', synonyms: ['heptane'], formula: 'C7H16', densityGPerMl: 0.684, refractiveIndexD20: 1.3878, flashPointC: -4, autoignitionC: 204 },
  '111-65-9': { name: 'n-octane', synonyms: ['octane'], formula: 'C8H18', densityGPerMl: 0.703, refractiveIndexD20: 1.3974, flashPointC: 13, autoignitionC: 206 },
  '110-82-7': { name: 'cyclohexane', synonyms: ['hexahydrobenzene'], formula: 'C6H12', densityGPerMl: 0.779, refractiveIndexD20: 1.4262, flashPointC: -20, autoignitionC: 245 },
  '108-87-2': { name: 'methylcyclohexane', synonyms: ['cyclohexylmethane'], formula: 'C7H14', densityGPerMl: 0.7694, refractiveIndexD20: 1.4231, flashPointC: -4, autoignitionC: 250 },
  '71-43-2': { name: 'benzene', synonyms: ['benzol'], formula: 'C6H6', densityGPerMl: 0.8765, refractiveIndexD20: 1.5011, flashPointC: -11, autoignitionC: 498, carcinogen: 'IARC group 1', toxic: true },
  '108-88-3': { name: 'toluene', synonyms: ['methylbenzene', 'toluol'], formula: 'C7H8', densityGPerMl: 0.8669, refractiveIndexD20: 1.4961, flashPointC: 4, autoignitionC: 480, toxic: true, notes: ['reproductive toxicant'] },
  '100-41-4': { name: 'ethylbenzene', synonyms: ['phenylethane'], formula: 'C8H10', densityGPerMl: 0.867, refractiveIndexD20: 1.4959, flashPointC: 15, autoignitionC: 432, carcinogen: 'IARC group 2B' },
  '106-42-3': { name: 'p-xylene', synonyms: ['para-xylene', '1,4-dimethylbenzene', '1,4-xylene'], formula: 'C8H10', densityGPerMl: 0.8611, refractiveIndexD20: 1.4958, flashPointC: 27, autoignitionC: 528 },
  '95-47-6': { name: 'o-xylene', synonyms: ['ortho-xylene', '1,2-dimethylbenzene', '1,2-xylene'], formula: 'C8H10', densityGPerMl: 0.8802, refractiveIndexD20: 1.5055, flashPointC: 32, autoignitionC: 463 },
  '108-38-3': { name: 'm-xylene', synonyms: ['meta-xylene', '1,3-dimethylbenzene', '1,3-xylene'], formula: 'C8H10', densityGPerMl: 0.8642, refractiveIndexD20: 1.4972, flashPointC: 27, autoignitionC: 527 },
  '108-90-7': { name: 'chlorobenzene', synonyms: ['phenyl chloride', 'monochlorobenzene'], formula: 'C6H5Cl', densityGPerMl: 1.1058, refractiveIndexD20: 1.5241, flashPointC: 29, autoignitionC: 593, toxic: true },
  '75-09-2': { name: 'dichloromethane', synonyms: ['methylene chloride', 'DCM', 'methylene dichloride'], formula: 'CH2Cl2', densityGPerMl: 1.3266, refractiveIndexD20: 1.4242, flashPointC: null, autoignitionC: 556, carcinogen: 'IARC group 2A', toxic: true, notes: ['practically non-flammable, but its vapour decomposes to toxic gases over hot surfaces'] },
  '67-66-3': { name: 'chloroform', synonyms: ['trichloromethane', 'CHCl3'], formula: 'CHCl3', densityGPerMl: 1.4832, refractiveIndexD20: 1.4459, flashPointC: null, autoignitionC: null, carcinogen: 'IARC group 2B', toxic: true, notes: ['forms phosgene in light and air; usually sold stabilised'] },
  '56-23-5': { name: 'carbon tetrachloride', synonyms: ['tetrachloromethane', 'CCl4'], formula: 'CCl4', densityGPerMl: 1.594, refractiveIndexD20: 1.4601, flashPointC: null, autoignitionC: null, carcinogen: 'IARC group 2B', toxic: true },
  '107-06-2': { name: '1,2-dichloroethane', synonyms: ['ethylene dichloride', 'DCE', 'EDC'], formula: 'C2H4Cl2', densityGPerMl: 1.253, refractiveIndexD20: 1.4448, flashPointC: 13, autoignitionC: 413, carcinogen: 'IARC group 2B', toxic: true },
  '60-29-7': { name: 'diethyl ether', synonyms: ['ether', 'ethyl ether', 'ethoxyethane', 'Et2O'], formula: 'C4H10O', densityGPerMl: 0.7134, refractiveIndexD20: 1.3526, flashPointC: -45, autoignitionC: 160, peroxideFormer: true },
  '109-99-9': { name: 'tetrahydrofuran', synonyms: ['THF', 'oxolane'], formula: 'C4H8O', densityGPerMl: 0.889, refractiveIndexD20: 1.4050, flashPointC: -14, autoignitionC: 321, peroxideFormer: true },
  '123-91-1': { name: '1,4-dioxane', synonyms: ['dioxane', 'p-dioxane'], formula: 'C4H8O2', densityGPerMl: 1.0337, refractiveIndexD20: 1.4224, flashPointC: 12, autoignitionC: 180, peroxideFormer: true, carcinogen: 'IARC group 2B' },
  '141-78-6': { name: 'ethyl acetate', synonyms: ['EtOAc', 'ethyl ethanoate', 'acetic ester'], formula: 'C4H8O2', densityGPerMl: 0.9003, refractiveIndexD20: 1.3723, flashPointC: -4, autoignitionC: 427 },
  '79-20-9': { name: 'methyl acetate', synonyms: ['MeOAc', 'methyl ethanoate'], formula: 'C3H6O2', densityGPerMl: 0.9342, refractiveIndexD20: 1.3614, flashPointC: -10, autoignitionC: 454 },
  '123-86-4': { name: 'n-butyl acetate', synonyms: ['butyl acetate', 'BuOAc', 'butyl ethanoate'], formula: 'C6H12O2', densityGPerMl: 0.8825, refractiveIndexD20: 1.3941, flashPointC: 22, autoignitionC: 421 },
  '75-05-8': { name: 'acetonitrile', synonyms: ['MeCN', 'methyl cyanide', 'ethanenitrile', 'ACN'], formula: 'C2H3N', densityGPerMl: 0.7857, refractiveIndexD20: 1.3442, flashPointC: 2, autoignitionC: 524, toxic: true },
  '64-19-7': { name: 'acetic acid', synonyms: ['glacial acetic acid', 'ethanoic acid', 'AcOH'], formula: 'C2H4O2', densityGPerMl: 1.049, refractiveIndexD20: 1.3720, flashPointC: 39, autoignitionC: 463, toxic: true, notes: ['corrosive'] },
  '78-93-3': { name: '2-butanone', synonyms: ['methyl ethyl ketone', 'MEK', 'butanone', 'butan-2-one'], formula: 'C4H8O', densityGPerMl: 0.805, refractiveIndexD20: 1.3788, flashPointC: -9, autoignitionC: 505 },
  '1634-04-4': { name: 'methyl tert-butyl ether', synonyms: ['MTBE', 'tert-butyl methyl ether', '2-methoxy-2-methylpropane'], formula: 'C5H12O', densityGPerMl: 0.7405, refractiveIndexD20: 1.3690, flashPointC: -28, autoignitionC: 224, notes: ['autoignition figures in safety data sheets range widely; the lowest is given'] },
  '108-20-3': { name: 'diisopropyl ether', synonyms: ['isopropyl ether', 'DIPE', '2-isopropoxypropane'], formula: 'C6H14O', densityGPerMl: 0.7241, refractiveIndexD20: 1.3681, flashPointC: -28, autoignitionC: 443, peroxideFormer: true, notes: ['forms explosive peroxides even unopened; among the most dangerous peroxide formers'] },
  '110-86-1': { name: 'pyridine', synonyms: ['azine', 'py'], formula: 'C5H5N', densityGPerMl: 0.9819, refractiveIndexD20: 1.5095, flashPointC: 20, autoignitionC: 482, toxic: true },
  '68-12-2': { name: 'N,N-dimethylformamide', synonyms: ['DMF', 'dimethylformamide'], formula: 'C3H7NO', densityGPerMl: 0.9487, refractiveIndexD20: 1.4305, flashPointC: 58, autoignitionC: 445, carcinogen: 'IARC group 2A', toxic: true, notes: ['reproductive toxicant; absorbed through skin'] },
  '67-68-5': { name: 'dimethyl sulfoxide', synonyms: ['DMSO', 'methyl sulfoxide'], formula: 'C2H6OS', densityGPerMl: 1.1004, refractiveIndexD20: 1.4793, flashPointC: 89, autoignitionC: 215, notes: ['decomposes near its boiling point; distil under reduced pressure', 'carries dissolved substances through skin'] },
  '100-66-3': { name: 'anisole', synonyms: ['methoxybenzene', 'methyl phenyl ether'], formula: 'C7H8O', densityGPerMl: 0.995, refractiveIndexD20: 1.5174, flashPointC: 52, autoignitionC: 475 },
  '98-82-8': { name: 'cumene', synonyms: ['isopropylbenzene', '(1-methylethyl)benzene'], formula: 'C9H12', densityGPerMl: 0.8618, refractiveIndexD20: 1.4915, flashPointC: 36, autoignitionC: 424, peroxideFormer: true, carcinogen: 'IARC group 2B' },
  '108-67-8': { name: 'mesitylene', synonyms: ['1,3,5-trimethylbenzene'], formula: 'C9H12', densityGPerMl: 0.8652, refractiveIndexD20: 1.4994, flashPointC: 50, autoignitionC: 550 },
  '109-69-3': { name: '1-chlorobutane', synonyms: ['n-butyl chloride', 'butyl chloride', '1-butyl chloride'], formula: 'C4H9Cl', densityGPerMl: 0.8862, refractiveIndexD20: 1.4021, flashPointC: -9, autoignitionC: 460 },
  '75-52-5': { name: 'nitromethane', synonyms: ['nitrocarbol', 'MeNO2'], formula: 'CH3NO2', densityGPerMl: 1.1371, refractiveIndexD20: 1.3817, flashPointC: 35, autoignitionC: 418, carcinogen: 'IARC group 2B', toxic: true, notes: ['can detonate when heated under confinement or when mixed with amines or bases; never distil to dryness'] },
  '75-15-0': { name: 'carbon disulfide', synonyms: ['carbon disulphide', 'CS2', 'carbon bisulfide'], formula: 'CS2', densityGPerMl: 1.2632, refractiveIndexD20: 1.6319, flashPointC: -30, autoignitionC: 90, toxic: true, notes: ['autoignition near 90 degC: a steam pipe or a hot plate can ignite the vapour'] },
  '121-44-8': { name: 'triethylamine', synonyms: ['TEA', 'Et3N', 'N,N-diethylethanamine'], formula: 'C6H15N', densityGPerMl: 0.726, refractiveIndexD20: 1.4010, flashPointC: -11, autoignitionC: 312, toxic: true, notes: ['corrosive'] },
  '540-84-1': { name: 'isooctane', synonyms: ['2,2,4-trimethylpentane', 'iso-octane'], formula: 'C8H18', densityGPerMl: 0.6919, refractiveIndexD20: 1.3915, flashPointC: -12, autoignitionC: 396 },
  '5989-27-5': { name: 'limonene', synonyms: ['D-limonene', '(R)-(+)-limonene', 'dipentene', 'L-limonene', 'racemic limonene', '138-86-3', '5989-54-8'], formula: 'C10H16', densityGPerMl: 0.8411, refractiveIndexD20: 1.4730, flashPointC: 48, autoignitionC: 237, peroxideFormer: true, notes: ['oxidises in air to skin-sensitising hydroperoxides'] },
};
