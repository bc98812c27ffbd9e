/**
 * Baseline for bench/pmv.bench.ts: a line-for-line TypeScript port of the BASIC computer
 * program for PMV and PPD in ISO 7730:2005 Annex D.
 *
 * Provenance: the ISO document itself was not available while writing this port. The
 * listing's structure (line numbers, variable names, the damped fixed-point iteration with
 * EPS = 0.00015 and the 150-iteration guard) was reconstructed from memory and checked
 * against several public transcriptions of the program. Where those transcriptions differ
 * (the first guess of the clothing temperature uses (3.5·ICL + 0.1) in some and
 * (3.5·(6.45·ICL + 0.1)) in others; XF starts at TCLA/50 or at XN), the variant used here is
 * the one that also appears in the ASHRAE 55 version of the program; both choices only
 * change the number of iterations, not the converged result.
 *
 * INPUT/PRINT lines become the function's parameters and return value. BASIC's `^` is `**`.
 * This file is benchmark scaffolding, not library code.
 */

/** Result of the Annex D program (its PRINT statements). */
export interface AnnexDResult {
  pmv: number;
  ppd: number;
}

/**
 * ISO 7730:2005 Annex D program, ported line for line.
 *
 * @param CLO clothing, clo.
 * @param MET metabolic rate, met.
 * @param WME external work, met (normally around 0).
 * @param TA  air temperature, °C.
 * @param TR  mean radiant temperature, °C.
 * @param VEL relative air velocity, m/s.
 * @param RH  relative humidity, %.
 * @param PAin water vapour pressure, Pa (0 = compute from RH, as the program asks).
 * @returns PMV and PPD; PMV = 999999 and PPD = 100 when the iteration exceeds 150 steps.
 */
export function iso7730AnnexD(
  CLO: number,
  MET: number,
  WME: number,
  TA: number,
  TR: number,
  VEL: number,
  RH: number,
  PAin = 0,
): AnnexDResult {
  // 10-130: INPUT CLO, MET, WME, TA, TR, VEL, RH, PA
  let PA = PAin;
  // 140 DEF FNPS(T)=EXP(16.6536-4030.183/(T+235))   'saturated vapour pressure, kPa
  const FNPS = (T: number): number => Math.exp(16.6536 - 4030.183 / (T + 235));
  // 150 IF PA=0 THEN PA=RH*10*FNPS(TA)   'water vapour pressure, Pa
  if (PA === 0) PA = RH * 10 * FNPS(TA);
  // 160 ICL=.155*CLO   'thermal insulation of the clothing in m2K/W
  const ICL = 0.155 * CLO;
  // 170 M=MET*58.15   'metabolic rate in W/m2
  const M = MET * 58.15;
  // 180 W=WME*58.15   'external work in W/m2
  const W = WME * 58.15;
  // 190 MW=M-W   'internal heat production in the human body
  const MW = M - W;
  // 200 IF ICL<=.078 THEN FCL=1+1.29*ICL ELSE FCL=1.05+.645*ICL   'clothing area factor
  let FCL: number;
  if (ICL <= 0.078) FCL = 1 + 1.29 * ICL;
  else FCL = 1.05 + 0.645 * ICL;
  // 210 HCF=12.1*SQR(VEL)   'heat transf. coeff. by forced convection
  const HCF = 12.1 * Math.sqrt(VEL);
  // 220 TAA=TA+273   'air temperature in Kelvin
  const TAA = TA + 273;
  // 230 TRA=TR+273   'mean radiant temperature in Kelvin
  const TRA = TR + 273;
  // 240 '---------CALCULATE SURFACE TEMPERATURE OF CLOTHING BY ITERATION---------
  // 250 TCLA=TAA+(35.5-TA)/(3.5*ICL+.1)   'first guess for surface temperature of clothing
  const TCLA = TAA + (35.5 - TA) / (3.5 * ICL + 0.1);
  // 260 P1=ICL*FCL   'calculation term
  const P1 = ICL * FCL;
  // 270 P2=P1*3.96   'calculation term
  const P2 = P1 * 3.96;
  // 280 P3=P1*100   'calculation term
  const P3 = P1 * 100;
  // 290 P4=P1*TAA   'calculation term
  const P4 = P1 * TAA;
  // 300 P5=308.7-.028*MW+P2*(TRA/100)^4   'calculation term
  const P5 = 308.7 - 0.028 * MW + P2 * (TRA / 100) ** 4;
  // 310 XN=TCLA/100
  let XN = TCLA / 100;
  // 320 XF=TCLA/50
  let XF = TCLA / 50;
  // 330 N=0   'N: number of iterations
  let N = 0;
  // 340 EPS=.00015   'stop criteria in iteration
  const EPS = 0.00015;
  let HC = 0;
  for (;;) {
    // 350 XF=(XF+XN)/2
    XF = (XF + XN) / 2;
    // 360 HCN=2.38*ABS(100*XF-TAA)^.25   'heat transf. coeff. by natural convection
    const HCN = 2.38 * Math.abs(100 * XF - TAA) ** 0.25;
    // 370 IF HCF>HCN THEN HC=HCF ELSE HC=HCN
    if (HCF > HCN) HC = HCF;
    else HC = HCN;
    // 380 XN=(P5+P4*HC-P2*XF^4)/(100+P3*HC)
    XN = (P5 + P4 * HC - P2 * XF ** 4) / (100 + P3 * HC);
    // 390 N=N+1
    N = N + 1;
    // 400 IF N>150 GOTO 550
    if (N > 150) {
      // 550 PMV=999999!
      // 560 PPD=100
      return { pmv: 999999, ppd: 100 };
    }
    // 410 IF ABS(XN-XF)>EPS GOTO 350
    if (!(Math.abs(XN - XF) > EPS)) break;
  }
  // 420 TCL=100*XN-273   'surface temperature of the clothing
  const TCL = 100 * XN - 273;
  // 430 '---------HEAT LOSS COMPONENTS---------
  // 440 HL1=3.05*.001*(5733-6.99*MW-PA)   'heat loss diff. through skin
  const HL1 = 3.05 * 0.001 * (5733 - 6.99 * MW - PA);
  // 450 IF MW>58.15 THEN HL2=.42*(MW-58.15) ELSE HL2=0!   'heat loss by sweating (comfort)
  let HL2: number;
  if (MW > 58.15) HL2 = 0.42 * (MW - 58.15);
  else HL2 = 0;
  // 460 HL3=1.7*.00001*M*(5867-PA)   'latent respiration heat loss
  const HL3 = 1.7 * 0.00001 * M * (5867 - PA);
  // 470 HL4=.0014*M*(34-TA)   'dry respiration heat loss
  const HL4 = 0.0014 * M * (34 - TA);
  // 480 HL5=3.96*FCL*(XN^4-(TRA/100)^4)   'heat loss by radiation
  const HL5 = 3.96 * FCL * (XN ** 4 - (TRA / 100) ** 4);
  // 490 HL6=FCL*HC*(TCL-TA)   'heat loss by convection
  const HL6 = FCL * HC * (TCL - TA);
  // 500 '---------CALCULATE PMV AND PPD---------
  // 510 TS=.303*EXP(-.036*M)+.028   'thermal sensation trans coeff
  const TS = 0.303 * Math.exp(-0.036 * M) + 0.028;
  // 520 PMV=TS*(MW-HL1-HL2-HL3-HL4-HL5-HL6)   'predicted mean vote
  const PMV = TS * (MW - HL1 - HL2 - HL3 - HL4 - HL5 - HL6);
  // 530 PPD=100-95*EXP(-.03353*PMV^4-.2179*PMV^2)   'predicted percentage dissat.
  const PPD = 100 - 95 * Math.exp(-0.03353 * PMV ** 4 - 0.2179 * PMV ** 2);
  // 540 GOTO 570; 570-600 PRINT "OUTPUT", PMV, PPD
  return { pmv: PMV, ppd: PPD };
}
