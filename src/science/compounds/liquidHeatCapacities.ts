// Liquid molar heat capacity at constant pressure near 25 degC, by CAS number. Units: J/(mol K).
// EVERY value here is recalled (from memory) from NIST Chemistry WebBook / CRC Handbook figures
// of the usual kind, not looked up; they are good to a few per cent, which is all the column
// simulator needs (it only sets how long the pot takes to warm). Check a handbook before using
// them for anything else.
export const liquidHeatCapacitiesJPerMolK: Readonly<Record<string, number>> = {
  '67-64-1': 125.5, // acetone
  '67-56-1': 81.1, // methanol
  '64-17-5': 112.3, // ethanol
  '71-23-8': 143.9, // 1-propanol
  '67-63-0': 156.5, // 2-propanol
  '71-36-3': 177.2, // 1-butanol
  '7732-18-5': 75.3, // water
  '109-66-0': 167.2, // n-pentane
  '110-54-3': 195.6, // n-hexane
  '142-82-5': 224.7, // n-heptane
  '111-65-9': 254.6, // n-octane
  '110-82-7': 156.0, // cyclohexane
  '108-87-2': 184.8, // methylcyclohexane
  '71-43-2': 136.0, // benzene
  '108-88-3': 157.1, // toluene
  '100-41-4': 183.2, // ethylbenzene
  '106-42-3': 181.5, // p-xylene
  '95-47-6': 186.1, // o-xylene
  '108-38-3': 183.0, // m-xylene
  '108-90-7': 150.1, // chlorobenzene
  '75-09-2': 101.2, // dichloromethane
  '67-66-3': 114.2, // chloroform
  '56-23-5': 131.7, // carbon tetrachloride
  '107-06-2': 128.9, // 1,2-dichloroethane
  '60-29-7': 172.5, // diethyl ether
  '109-99-9': 124.0, // tetrahydrofuran
  '123-91-1': 152.1, // 1,4-dioxane
  '141-78-6': 170.7, // ethyl acetate
  '79-20-9': 141.9, // methyl acetate
  '123-86-4': 225.1, // n-butyl acetate
  '75-05-8': 91.7, // acetonitrile
  '64-19-7': 123.1, // acetic acid
  '78-93-3': 158.7, // 2-butanone
  '1634-04-4': 187.5, // methyl tert-butyl ether
  '108-20-3': 216.8, // diisopropyl ether
  '110-86-1': 132.7, // pyridine
  '68-12-2': 146.1, // N,N-dimethylformamide
  '67-68-5': 153.0, // dimethyl sulfoxide
  '100-66-3': 199.0, // anisole
  '98-82-8': 210.7, // cumene
  '108-67-8': 209.3, // mesitylene
  '109-69-3': 175.0, // 1-chlorobutane
  '75-52-5': 106.6, // nitromethane
  '75-15-0': 76.0, // carbon disulfide
  '121-44-8': 219.9, // triethylamine
  '540-84-1': 239.0, // isooctane
  '5989-27-5': 249.0, // limonene
};
