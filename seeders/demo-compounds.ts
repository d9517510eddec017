/**
 * Real, common laboratory compounds (structures as SMILES) for the demo. The chromatographic numbers
 * beside them are INVENTED for the demo: `x30` is the fraction of the strong solvent at which the demo
 * says the compound runs at Rf ≈ 0.3, chosen by common practice so that polar compounds need more
 * strong solvent than non-polar ones. They are not measurements.
 *
 * system: EH = EtOAc in hexanes, DM = MeOH in DCM, EP = Et2O in pentane, RP = MeCN in water on C18.
 * needs: 'base' (amine: streaks without Et3N), 'acid' (carboxylic acid: tails without AcOH),
 * 'gentle' (acid-sensitive: decomposes on plain silica), 'ammonia' (very polar base).
 */
export interface DemoCompound {
  name: string;
  smiles: string;
  system: 'EH' | 'DM' | 'EP' | 'RP';
  x30: number;
  needs?: 'base' | 'acid' | 'gentle' | 'ammonia';
}

const c = (
  name: string,
  smiles: string,
  system: DemoCompound['system'],
  x30: number,
  needs?: DemoCompound['needs'],
): DemoCompound => ({ name, smiles, system, x30, needs });

export const demoCompounds: readonly DemoCompound[] = [
  // alcohols and diols
  c('benzyl alcohol', 'OCc1ccccc1', 'EH', 0.22),
  c('1-phenylethanol', 'CC(O)c1ccccc1', 'EH', 0.19),
  c('cinnamyl alcohol', 'OC/C=C/c1ccccc1', 'EH', 0.23),
  c('4-methoxybenzyl alcohol', 'COc1ccc(CO)cc1', 'EH', 0.28),
  c('cyclohexanol', 'OC1CCCCC1', 'EH', 0.2),
  c('geraniol', 'CC(C)=CCC/C(C)=C/CO', 'EH', 0.18),
  c('hydrobenzoin', 'OC(c1ccccc1)C(O)c1ccccc1', 'EH', 0.45),
  c('1-octanol', 'CCCCCCCCO', 'EH', 0.15),
  c('2-phenylethanol', 'OCCc1ccccc1', 'EH', 0.25),
  c('(−)-menthol', 'CC(C)[C@@H]1CC[C@@H](C)C[C@H]1O', 'EH', 0.12),
  c('3-phenylprop-2-yn-1-ol', 'OCC#Cc1ccccc1', 'EH', 0.2),
  // ketones and aldehydes
  c('acetophenone', 'CC(=O)c1ccccc1', 'EH', 0.08),
  c('benzophenone', 'O=C(c1ccccc1)c1ccccc1', 'EH', 0.06),
  c('4′-methoxyacetophenone', 'COc1ccc(C(C)=O)cc1', 'EH', 0.13),
  c('cyclohexanone', 'O=C1CCCCC1', 'EH', 0.12),
  c('benzaldehyde', 'O=Cc1ccccc1', 'EH', 0.05),
  c('4-nitrobenzaldehyde', 'O=Cc1ccc([N+](=O)[O-])cc1', 'EH', 0.12),
  c('cinnamaldehyde', 'O=C/C=C/c1ccccc1', 'EH', 0.08),
  c('4′-bromoacetophenone', 'CC(=O)c1ccc(Br)cc1', 'EH', 0.07),
  c('chalcone', 'O=C(/C=C/c1ccccc1)c1ccccc1', 'EH', 0.07),
  c('camphor', 'CC1(C)[C@@H]2CC[C@@]1(C)C(=O)C2', 'EH', 0.07),
  c('2-bromoacetophenone', 'O=C(CBr)c1ccccc1', 'EH', 0.06),
  c('vanillin', 'COc1cc(C=O)ccc1O', 'EH', 0.3),
  c('thiophene-2-carbaldehyde', 'O=Cc1cccs1', 'EH', 0.08),
  // esters and lactones
  c('ethyl benzoate', 'CCOC(=O)c1ccccc1', 'EH', 0.04),
  c('methyl 4-nitrobenzoate', 'COC(=O)c1ccc([N+](=O)[O-])cc1', 'EH', 0.08),
  c('ethyl cinnamate', 'CCOC(=O)/C=C/c1ccccc1', 'EH', 0.05),
  c('methyl salicylate', 'COC(=O)c1ccccc1O', 'EH', 0.03),
  c('benzyl acetate', 'CC(=O)OCc1ccccc1', 'EH', 0.05),
  c('coumarin', 'O=c1ccc2ccccc2o1', 'EH', 0.15),
  c('dihydrocoumarin', 'O=C1CCc2ccccc2O1', 'EH', 0.1),
  c('benzocaine', 'CCOC(=O)c1ccc(N)cc1', 'EH', 0.25),
  c('diethyl malonate', 'CCOC(=O)CC(=O)OCC', 'EH', 0.1),
  // carboxylic acids
  c('benzoic acid', 'OC(=O)c1ccccc1', 'EH', 0.35, 'acid'),
  c('4-methoxybenzoic acid', 'COc1ccc(C(=O)O)cc1', 'EH', 0.45, 'acid'),
  c('cinnamic acid', 'OC(=O)/C=C/c1ccccc1', 'EH', 0.4, 'acid'),
  c('phenylacetic acid', 'OC(=O)Cc1ccccc1', 'EH', 0.38, 'acid'),
  c('ibuprofen', 'CC(C)Cc1ccc(C(C)C(=O)O)cc1', 'EH', 0.25, 'acid'),
  c('4-nitrobenzoic acid', 'OC(=O)c1ccc([N+](=O)[O-])cc1', 'EH', 0.55, 'acid'),
  // protected amino acids and carbamates
  c('N-Boc-glycine', 'CC(C)(C)OC(=O)NCC(=O)O', 'DM', 0.08, 'acid'),
  c('N-Boc-L-alanine', 'C[C@H](NC(=O)OC(C)(C)C)C(=O)O', 'DM', 0.07, 'acid'),
  c('N-Boc-L-phenylalanine', 'CC(C)(C)OC(=O)N[C@@H](Cc1ccccc1)C(=O)O', 'DM', 0.06, 'acid'),
  c('N-Boc-L-valine', 'CC(C)[C@H](NC(=O)OC(C)(C)C)C(=O)O', 'DM', 0.06, 'acid'),
  c('N-Boc-L-proline', 'CC(C)(C)OC(=O)N1CCC[C@H]1C(=O)O', 'DM', 0.06, 'acid'),
  c('N-Cbz-glycine', 'O=C(O)CNC(=O)OCc1ccccc1', 'DM', 0.07, 'acid'),
  c('N-Fmoc-glycine', 'O=C(O)CNC(=O)OCC1c2ccccc2-c2ccccc21', 'DM', 0.06, 'acid'),
  c('N-Boc-glycine methyl ester', 'COC(=O)CNC(=O)OC(C)(C)C', 'EH', 0.25),
  c('N-Boc-L-phenylalanine methyl ester', 'COC(=O)[C@H](Cc1ccccc1)NC(=O)OC(C)(C)C', 'EH', 0.18),
  c('N-Boc-benzylamine', 'CC(C)(C)OC(=O)NCc1ccccc1', 'EH', 0.12),
  c('L-phenylalanine', 'N[C@@H](Cc1ccccc1)C(=O)O', 'RP', 0.2),
  // amides, lactams, ureas
  c('benzamide', 'NC(=O)c1ccccc1', 'DM', 0.05),
  c('N-benzylacetamide', 'CC(=O)NCc1ccccc1', 'EH', 0.75),
  c('acetanilide', 'CC(=O)Nc1ccccc1', 'EH', 0.45),
  c('N,N-dimethylbenzamide', 'CN(C)C(=O)c1ccccc1', 'EH', 0.6),
  c('1-benzylpyrrolidin-2-one', 'O=C1CCCN1Cc1ccccc1', 'EH', 0.7),
  c('ε-caprolactam', 'O=C1CCCCCN1', 'DM', 0.05),
  c('phenylurea', 'NC(=O)Nc1ccccc1', 'DM', 0.06),
  c('1,3-diphenylurea', 'O=C(Nc1ccccc1)Nc1ccccc1', 'EH', 0.45),
  c('paracetamol', 'CC(=O)Nc1ccc(O)cc1', 'DM', 0.08),
  c('nicotinamide', 'NC(=O)c1cccnc1', 'DM', 0.1),
  // amines
  c('benzylamine', 'NCc1ccccc1', 'DM', 0.1, 'base'),
  c('dibenzylamine', 'c1ccc(CNCc2ccccc2)cc1', 'EH', 0.12, 'base'),
  c('1-benzylpiperidine', 'C1CCN(Cc2ccccc2)CC1', 'EH', 0.15, 'base'),
  c('4-benzylmorpholine', 'C1COCCN1Cc1ccccc1', 'EH', 0.25, 'base'),
  c('2-phenylethylamine', 'NCCc1ccccc1', 'DM', 0.12, 'base'),
  c('N-methylbenzylamine', 'CNCc1ccccc1', 'DM', 0.12, 'base'),
  c('1-benzylpiperazine', 'C1CN(CCN1)Cc1ccccc1', 'DM', 0.15, 'ammonia'),
  c('tryptamine', 'NCCc1c[nH]c2ccccc12', 'DM', 0.15, 'ammonia'),
  c('triphenylamine', 'c1ccc(N(c2ccccc2)c2ccccc2)cc1', 'EH', 0.008),
  // anilines
  c('aniline', 'Nc1ccccc1', 'EH', 0.15),
  c('4-nitroaniline', 'Nc1ccc([N+](=O)[O-])cc1', 'EH', 0.3),
  c('4-bromoaniline', 'Nc1ccc(Br)cc1', 'EH', 0.12),
  c('p-anisidine', 'COc1ccc(N)cc1', 'EH', 0.25, 'base'),
  c('N,N-dimethylaniline', 'CN(C)c1ccccc1', 'EH', 0.02),
  c('2-aminobenzophenone', 'Nc1ccccc1C(=O)c1ccccc1', 'EH', 0.1),
  c('diphenylamine', 'c1ccc(Nc2ccccc2)cc1', 'EH', 0.04),
  // pyridines and other heteroaromatics
  c('2-phenylpyridine', 'c1ccc(-c2ccccn2)cc1', 'EH', 0.1, 'base'),
  c('4-benzylpyridine', 'c1ccc(Cc2ccncc2)cc1', 'EH', 0.35, 'base'),
  c('2-acetylpyridine', 'CC(=O)c1ccccn1', 'EH', 0.25),
  c('4-(dimethylamino)pyridine', 'CN(C)c1ccncc1', 'DM', 0.12, 'ammonia'),
  c('quinoline', 'c1ccc2ncccc2c1', 'EH', 0.15, 'base'),
  c('2-bromopyridine', 'Brc1ccccn1', 'EH', 0.08),
  c('1-benzylimidazole', 'c1ccc(Cn2ccnc2)cc1', 'DM', 0.06, 'base'),
  c('benzimidazole', 'c1ccc2[nH]cnc2c1', 'DM', 0.07),
  c('indole', 'c1ccc2[nH]ccc2c1', 'EH', 0.1),
  c('5-bromoindole', 'Brc1ccc2[nH]ccc2c1', 'EH', 0.1),
  c('N-Boc-indole', 'CC(C)(C)OC(=O)n1ccc2ccccc21', 'EH', 0.02),
  c('carbazole', 'c1ccc2c(c1)[nH]c1ccccc12', 'EH', 0.12),
  c('2-methylbenzothiazole', 'Cc1nc2ccccc2s1', 'EH', 0.08),
  c('benzofuran', 'c1ccc2occc2c1', 'EP', 0.01),
  // nitro compounds
  c('nitrobenzene', '[O-][N+](=O)c1ccccc1', 'EH', 0.04),
  c('4-nitrotoluene', 'Cc1ccc([N+](=O)[O-])cc1', 'EH', 0.035),
  c('1-chloro-4-nitrobenzene', 'Clc1ccc([N+](=O)[O-])cc1', 'EH', 0.03),
  c('4-nitrophenol', 'Oc1ccc([N+](=O)[O-])cc1', 'EH', 0.3),
  c('2-nitrobenzyl alcohol', 'OCc1ccccc1[N+](=O)[O-]', 'EH', 0.3),
  // aryl and alkyl halides
  c('bromobenzene', 'Brc1ccccc1', 'EP', 0.004),
  c('4-bromoanisole', 'COc1ccc(Br)cc1', 'EH', 0.015),
  c('1-bromo-4-nitrobenzene', 'Brc1ccc([N+](=O)[O-])cc1', 'EH', 0.03),
  c('4-iodotoluene', 'Cc1ccc(I)cc1', 'EP', 0.004),
  c('4-bromobenzonitrile', 'N#Cc1ccc(Br)cc1', 'EH', 0.05),
  c('1-bromonaphthalene', 'Brc1cccc2ccccc12', 'EP', 0.005),
  c('benzyl bromide', 'BrCc1ccccc1', 'EH', 0.006),
  c('(3-bromopropyl)benzene', 'BrCCCc1ccccc1', 'EP', 0.006),
  // nitriles
  c('benzonitrile', 'N#Cc1ccccc1', 'EH', 0.05),
  c('4-methoxybenzonitrile', 'COc1ccc(C#N)cc1', 'EH', 0.08),
  c('phenylacetonitrile', 'N#CCc1ccccc1', 'EH', 0.07),
  // boronic acids and esters
  c('phenylboronic acid pinacol ester', 'CC1(C)OB(c2ccccc2)OC1(C)C', 'EH', 0.03),
  c('4-methoxyphenylboronic acid pinacol ester', 'COc1ccc(B2OC(C)(C)C(C)(C)O2)cc1', 'EH', 0.05),
  c('methyl 4-(pinacolatoboryl)benzoate', 'COC(=O)c1ccc(B2OC(C)(C)C(C)(C)O2)cc1', 'EH', 0.06),
  c('phenylboronic acid', 'OB(O)c1ccccc1', 'EH', 0.4, 'acid'),
  // silyl ethers and silanes
  c('benzyl tert-butyldimethylsilyl ether', 'CC(C)(C)[Si](C)(C)OCc1ccccc1', 'EH', 0.01),
  c('4-bromophenyl tert-butyldimethylsilyl ether', 'CC(C)(C)[Si](C)(C)Oc1ccc(Br)cc1', 'EP', 0.006),
  c('benzyl tert-butyldiphenylsilyl ether', 'CC(C)(C)[Si](OCc1ccccc1)(c1ccccc1)c1ccccc1', 'EH', 0.01),
  c('cyclohexyl tert-butyldimethylsilyl ether', 'CC(C)(C)[Si](C)(C)OC1CCCCC1', 'EP', 0.005),
  c('(trimethylsilyl)phenylacetylene', 'C[Si](C)(C)C#Cc1ccccc1', 'EP', 0.002),
  // epoxides, acetals, ethers
  c('styrene oxide', 'C1OC1c1ccccc1', 'EH', 0.05, 'gentle'),
  c('glycidyl phenyl ether', 'C(Oc1ccccc1)C1CO1', 'EH', 0.07, 'gentle'),
  c('cyclohexene oxide', 'C1CCC2OC2C1', 'EP', 0.04, 'gentle'),
  c('benzaldehyde dimethyl acetal', 'COC(OC)c1ccccc1', 'EH', 0.03, 'gentle'),
  c('2-phenyl-1,3-dioxolane', 'c1ccc(C2OCCO2)cc1', 'EH', 0.05, 'gentle'),
  c('anisole', 'COc1ccccc1', 'EP', 0.01),
  c('dibenzyl ether', 'c1ccc(COCc2ccccc2)cc1', 'EH', 0.02),
  c('diphenyl ether', 'c1ccc(Oc2ccccc2)cc1', 'EP', 0.005),
  c('allyl phenyl ether', 'C=CCOc1ccccc1', 'EP', 0.008),
  // phenols
  c('phenol', 'Oc1ccccc1', 'EH', 0.15),
  c('4-methoxyphenol', 'COc1ccc(O)cc1', 'EH', 0.2),
  c('2-naphthol', 'Oc1ccc2ccccc2c1', 'EH', 0.15),
  c('2,6-di-tert-butyl-4-methylphenol', 'Cc1cc(C(C)(C)C)c(O)c(C(C)(C)C)c1', 'EP', 0.006),
  // alkenes and alkynes
  c('trans-stilbene', 'c1ccc(/C=C/c2ccccc2)cc1', 'EP', 0.003),
  c('diphenylacetylene', 'c1ccc(C#Cc2ccccc2)cc1', 'EP', 0.003),
  c('4-ethynylanisole', 'C#Cc1ccc(OC)cc1', 'EH', 0.01),
  // sulfur and phosphorus
  c('thioanisole', 'CSc1ccccc1', 'EP', 0.008),
  c('methyl phenyl sulfone', 'CS(=O)(=O)c1ccccc1', 'EH', 0.35),
  c('p-toluenesulfonamide', 'Cc1ccc(S(N)(=O)=O)cc1', 'EH', 0.35),
  c('N-benzyl-p-toluenesulfonamide', 'Cc1ccc(S(=O)(=O)NCc2ccccc2)cc1', 'EH', 0.22),
  c('triphenylphosphine oxide', 'O=P(c1ccccc1)(c1ccccc1)c1ccccc1', 'DM', 0.03),
  c('diphenyl sulfide', 'c1ccc(Sc2ccccc2)cc1', 'EP', 0.003),
  c('4-methoxythiophenol', 'COc1ccc(S)cc1', 'EH', 0.02),
];
