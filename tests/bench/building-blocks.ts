/**
 * Building blocks for the generated benchmark library (tests/bench/library.ts). Written for this
 * repository from common laboratory reagents; the products are enumerated, not measured or taken
 * from any collection. Conventions that make string enumeration safe:
 * - a template holds one `{}` where the partner is inserted (as a branch or at the end);
 * - partners start with the atom that bonds (N for amines, O for alcohols, an aromatic atom for aryls);
 * - blocks use ring labels 1–9 and close every ring before a `{}`.
 */

/** Acyl groups from carboxylic acids: R–C(=O)–{}. */
export const acyls: readonly string[] = [
  'c1ccccc1', 'c1ccc(Cl)cc1', 'c1ccc(F)cc1', 'c1ccc(Br)cc1', 'c1ccc(C)cc1', 'c1ccc(OC)cc1', 'c1ccc(C(F)(F)F)cc1',
  'c1ccc(cc1)C#N', 'c1ccc(cc1)[N+](=O)[O-]', 'c1cccc(Cl)c1', 'c1ccccc1Cl', 'c1ccc2ccccc2c1', 'c1ccncc1', 'c1cccnc1',
  'c1ccccn1', 'c1ccsc1', 'c1ccoc1', 'c1cc2ccccc2[nH]1', 'c1c[nH]c2ccccc12', 'c1ccc2ncccc2c1', 'C', 'CC', 'CC(C)C',
  'C1CC1', 'C1CCCC1', 'C1CCCCC1', 'CC(C)(C)C', 'Cc1ccccc1', 'CCc1ccccc1', 'C=Cc1ccccc1', 'COC', 'CCC(=O)OC',
  'C1CCOCC1', 'C1CCN(CC1)C(=O)OC(C)(C)C', 'c1cnc2ccccc2n1', 'c1ccc2[nH]cnc2c1', 'c1cn(C)nc1', 'c1ncc[nH]1',
  'c1cc(C)on1', 'c1ccc(O)cc1', 'c1ccc(N(C)C)cc1', 'c1ccc(S(C)(=O)=O)cc1', 'c1ccc(cc1)-c1ccccc1',
  'c1ccc(OCc2ccccc2)cc1', 'C(F)(F)F', 'CCCC', 'CCCCC', 'CC#C', 'C#Cc1ccccc1', 'CSc1ccccc1', 'Cc1ccc(O)cc1',
  'COc1ccc(Cl)cc1', 'Cn1ccnc1', 'c1ccc2OCOc2c1', 'c1ccc(Cl)c(Cl)c1', 'c1ccc(cc1)S(N)(=O)=O', 'c1csc(C)n1',
  'c1ccc(cc1)C(C)=O', 'C=CC', 'C1CCc2ccccc21',
];

/** Amines, N first (primary, secondary, anilines, heteroaryl amines). */
export const amines: readonly string[] = [
  'NC', 'NCC', 'NCCC', 'NC(C)C', 'NC1CC1', 'NC1CCCC1', 'NC1CCCCC1', 'NCc1ccccc1', 'NCCc1ccccc1', 'NCc1ccc(Cl)cc1',
  'NCc1ccc(OC)cc1', 'NCc1ccco1', 'NCc1cccs1', 'NCc1ccncc1', 'NCc1cccnc1', 'NCCc1c[nH]c2ccccc12', 'NCCc1ccc(O)cc1',
  'NCCO', 'NCCOC', 'NCCN(C)C', 'NCCCN1CCOCC1', 'NCC1CCCO1', 'NCC(F)(F)F', 'NC(C)c1ccccc1', 'Nc1ccccc1',
  'Nc1ccc(Cl)cc1', 'Nc1ccc(F)cc1', 'Nc1ccc(OC)cc1', 'Nc1ccc(C)cc1', 'Nc1cccc(C(F)(F)F)c1', 'Nc1ccccn1', 'Nc1ccncc1',
  'Nc1cccnc1', 'Nc1ccc2ccccc2c1', 'Nc1nccs1', 'Nc1ccon1', 'Nc1ccnn1C', 'Nc1ccc(N2CCOCC2)cc1', 'Nc1ccc(cc1)C(=O)OC',
  'Nc1cccc(c1)C#N', 'Nc1ccc2[nH]ccc2c1', 'Nc1ccc2OCOc2c1', 'NC(C)(C)C', 'NCC(C)C', 'NCCCC', 'NCCCCCC', 'NCC=C',
  'NCC#C', 'NC1CCOCC1', 'NC1CCN(CC1)C(=O)OC(C)(C)C', 'NCC(=O)OC', 'NC(C)C(=O)OC', 'N1CCCC1', 'N1CCCCC1',
  'N1CCOCC1', 'N1CCN(C)CC1', 'N1CCN(CC1)c1ccccc1', 'N1CCN(CC1)C(=O)OC(C)(C)C', 'N1CCC(O)CC1', 'N1CCc2ccccc2C1',
  'N1CCCc2ccccc12', 'N(C)C', 'N(C)Cc1ccccc1', 'N(CC)CC', 'N(C)c1ccccc1', 'N1CC(F)(F)C1', 'N1CCSCC1',
  'N1CCS(=O)(=O)CC1', 'N1CCC(F)(F)CC1', 'N(C)CCO', 'N1CCCCCC1', 'N1CCCC1c1ccccc1', 'N1CCC(CC1)c1ccccc1',
  'N1CCC(CC1)C(=O)OCC', 'N(C)C1CCCCC1', 'N1CCn2ccnc2C1', 'N1CCOC(C)C1', 'NCc1ccc(cc1)S(N)(=O)=O',
];

/** Sulfonyl groups from sulfonyl chlorides: R–S(=O)2–{}. */
export const sulfonyls: readonly string[] = [
  'c1ccccc1', 'c1ccc(C)cc1', 'c1ccc(Cl)cc1', 'c1ccc(F)cc1', 'c1ccc(OC)cc1', 'c1ccc(cc1)C(F)(F)F',
  'c1ccc(cc1)[N+](=O)[O-]', 'c1ccc2ccccc2c1', 'c1cccs1', 'c1cn(C)cn1', 'C', 'CC', 'CCC', 'C(C)C', 'C1CC1',
  'Cc1ccccc1', 'c1ccc(NC(C)=O)cc1', 'c1cccc(c1)C#N', 'c1ccccc1Cl', 'c1ccc(Br)cc1', 'c1cccnc1', 'CCCC',
  'C(F)(F)F', 'c1ccc(cc1)C(C)(C)C', 'c1c(C)onc1C',
];

/** Alcohols and phenols, O first. */
export const alcohols: readonly string[] = [
  'OC', 'OCC', 'OCCC', 'OC(C)C', 'OCC(C)C', 'OC(C)(C)C', 'OCc1ccccc1', 'OCCc1ccccc1', 'OC1CCCC1', 'OC1CCCCC1',
  'OCC=C', 'OCC#C', 'OCCOC', 'OCC(F)(F)F', 'OCc1ccco1', 'OCc1ccccn1', 'OCCN1CCOCC1', 'OCCN(C)C', 'OC1CCOCC1',
  'OC1CCN(CC1)C(=O)OC(C)(C)C', 'Oc1ccccc1', 'Oc1ccc(Cl)cc1', 'Oc1ccc(F)cc1', 'Oc1ccc(OC)cc1', 'Oc1ccc(C)cc1',
  'Oc1ccc(cc1)C#N', 'Oc1ccc(cc1)C(=O)OC', 'Oc1cccc(c1)C(F)(F)F', 'Oc1ccccc1C', 'Oc1ccc2ccccc2c1', 'Oc1cccnc1',
  'Oc1ccc2OCOc2c1', 'Oc1ccc(cc1)[N+](=O)[O-]', 'Oc1ccc(Br)cc1', 'Oc1ccc(cc1)C(C)=O', 'Oc1c(C)cccc1C',
  'OCc1ccc(Cl)cc1', 'OCc1ccc(OC)cc1', 'OCCCc1ccccc1', 'OCC1CCCCC1', 'OC(C)c1ccccc1', 'OCc1cccs1', 'OCCOc1ccccc1',
];

/** Alkyl templates from alkyl halides and aldehydes (reductive amination): C–{}. */
export const alkyls: readonly string[] = [
  'C({})c1ccccc1', 'C({})c1ccc(Cl)cc1', 'C({})c1ccc(OC)cc1', 'C({})c1ccccn1', 'C({})c1ccncc1', 'C({})c1cccs1',
  'C({})c1ccco1', 'C({})C', 'C({})CC', 'C({})CCC', 'C({})C(C)C', 'C({})C1CC1', 'C({})C=C', 'C({})C#C',
  'C({})CC(=O)OC', 'C({})C(=O)OCC', 'C({})C(=O)N(C)C', 'C({})CCN1CCOCC1', 'C({})CCOC', 'C({})c1ccc(cc1)C#N',
  'C({})c1ccc(F)cc1F', 'C({})c1cccc2ccccc12', 'C({})c1nccs1', 'C({})c1ccc2OCOc2c1', 'C({})c1cn(C)nc1',
  'C({})C(F)(F)F', 'C(C)({})c1ccccc1', 'C({})c1ccc(cc1)C(F)(F)F', 'C({})c1ccccc1Br',
];

/** Isocyanate and chloroformate templates: ureas and carbamates on an amine. */
export const carbonylCaps: readonly string[] = [
  'O=C({})Nc1ccccc1', 'O=C({})Nc1ccc(Cl)cc1', 'O=C({})NC', 'O=C({})NCC', 'O=C({})NC(C)C', 'O=C({})NC1CCCCC1',
  'O=C({})NCc1ccccc1', 'O=C({})OC(C)(C)C', 'O=C({})OCc1ccccc1', 'O=C({})OCC', 'O=C({})OC',
];

/** Aryl halides (template, partner appended) and aryl boronic acid partners for biaryls. */
export const arylHalides: readonly string[] = [
  'c1ccc(cc1){}', 'COc1ccc(cc1){}', 'Clc1ccc(cc1){}', 'OC(=O)c1ccc(cc1){}', 'CC(=O)Nc1ccc(cc1){}', 'N#Cc1ccc(cc1){}',
  'c1ccnc(c1){}', 'CS(=O)(=O)c1ccc(cc1){}', 'Cc1ccc(cc1){}', 'FC(F)(F)c1ccc(cc1){}', 'CN(C)c1ccc(cc1){}',
  'O=Cc1ccc(cc1){}', 'OCc1ccc(cc1){}', 'c1cnc(nc1){}', 'Cn1cc(cn1){}',
];
export const arylPartners: readonly string[] = [
  'c1ccccc1', 'c1ccncc1', 'c1cccnc1', 'c1ccc(F)cc1', 'c1ccc(OC)cc1', 'c1ccsc1', 'c1ccoc1', 'c1cn(C)nc1',
  'c1ccc2[nH]ccc2c1', 'c1ccc(cc1)C(=O)OC', 'c1ccc(Cl)cc1', 'c1cccc(c1)C#N', 'c1ccc2ccccc2c1', 'c1cnoc1',
];

/** Bifunctional linkers, N first, ending where the partner (amine or alcohol) is appended. */
export const linkers: readonly string[] = [
  'NCC(=O){}', 'NC(C)C(=O){}', 'NCCC(=O){}', 'NCCCC(=O){}', 'N1CCCC1C(=O){}', 'N1CCC(CC1)C(=O){}',
  'N1CCCC(C1)C(=O){}', 'Nc1ccc(cc1)C(=O){}', 'Nc1cccc(c1)C(=O){}', 'NCc1ccc(cc1)C(=O){}', 'NC1CCC(CC1)C(=O){}',
  'NC(Cc1ccccc1)C(=O){}', 'NC(CC(C)C)C(=O){}', 'NC(CO)C(=O){}', 'NC(Cc1c[nH]c2ccccc12)C(=O){}', 'NC(CCSC)C(=O){}',
  'NC(C(C)C)C(=O){}', 'Nc1ccc(cc1)S(=O)(=O){}', 'N1CCN(CC1)C(=O){}', 'NCc1ccc(o1)C(=O){}',
];
