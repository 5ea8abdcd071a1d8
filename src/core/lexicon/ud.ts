// Universal Dependencies v2 tag inventory: the 17 UPOS tags and the universal features with their values.
// Source: the UD v2 guidelines (universaldependencies.org, "Universal features"), values listed from memory.

export const UPOS_TAGS = [
  'ADJ', 'ADP', 'ADV', 'AUX', 'CCONJ', 'DET', 'INTJ', 'NOUN', 'NUM',
  'PART', 'PRON', 'PROPN', 'PUNCT', 'SCONJ', 'SYM', 'VERB', 'X',
] as const

export type Upos = (typeof UPOS_TAGS)[number]

const v = (s: string): readonly string[] => s.split(' ')

/** Universal feature name → its universal values (UD v2). */
export const UNIVERSAL_FEATURES: Readonly<Record<string, readonly string[]>> = {
  PronType: v('Art Dem Emp Exc Ind Int Neg Prs Rcp Rel Tot'),
  NumType: v('Card Dist Frac Mult Ord Range Sets'),
  Poss: v('Yes'),
  Reflex: v('Yes'),
  Foreign: v('Yes'),
  Abbr: v('Yes'),
  Typo: v('Yes'),
  ExtPos: v('ADJ ADP ADV AUX CCONJ DET INTJ PRON PROPN SCONJ'),
  Gender: v('Com Fem Masc Neut'),
  Animacy: v('Anim Hum Inan Nhum'),
  NounClass: v(
    'Bantu1 Bantu2 Bantu3 Bantu4 Bantu5 Bantu6 Bantu7 Bantu8 Bantu9 Bantu10 Bantu11 Bantu12 Bantu13 Bantu14 Bantu15 Bantu16 Bantu17 Bantu18 Bantu19 Bantu20 Bantu21 Bantu22 Bantu23 Wol1 Wol2 Wol3 Wol4 Wol5 Wol6 Wol7 Wol8 Wol9 Wol10 Wol11 Wol12',
  ),
  Number: v('Coll Count Dual Grpa Grpl Inv Pauc Plur Ptan Sing Tri'),
  Case: v(
    'Abs Acc Erg Nom Abe Ben Cau Cmp Cns Com Dat Dis Equ Gen Ins Par Tem Tra Voc Abl Add Ade All Del Ela Ess Ill Ine Lat Loc Per Sbe Sbl Spl Sub Sup Ter',
  ),
  Definite: v('Com Cons Def Ind Spec'),
  Deixis: v('Abv Bel Even Med Nvis Prox Remt'),
  DeixisRef: v('1 2'),
  Degree: v('Abs Aug Cmp Dim Equ Pos Sup'),
  VerbForm: v('Conv Fin Gdv Ger Inf Part Sup Vnoun'),
  Mood: v('Adm Cnd Des Imp Ind Int Irr Jus Nec Opt Pot Prp Qot Sub'),
  Tense: v('Fut Imp Past Pqp Pres'),
  Aspect: v('Hab Imp Iter Perf Prog Prosp'),
  Voice: v('Act Antip Bfoc Cau Dir Inv Lfoc Mid Pass Rcp'),
  Evident: v('Fh Nfh'),
  Polarity: v('Neg Pos'),
  Person: v('0 1 2 3 4'),
  Polite: v('Elev Form Humb Infm'),
  Clusivity: v('Ex In'),
}
