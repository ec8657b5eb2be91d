/**
 * Method summary for the study appendix: a compact, structured account of every model and correction
 * method a study uses, with its formulas and published sources, and the references list they cite.
 *
 * This is text, not computation: it restates in short form the method write-ups in docs/methods/
 * (atmosphere-climate-runway.md, route.md, takeoff.md, landing-corrections-classification.md) so that
 * an appendix reader can check the numbers without the code. Each entry names the doc it condenses and
 * a few phrases of that doc (`docAnchors`) that a test looks for, so the two cannot silently drift.
 * Sources are the references listed in METHOD_REFERENCES below (titles as found); items marked
 * "from memory" there are marked the same way here.
 *
 * Formulas use Unicode (ρ, σ, ≥, ·); renderers that cannot draw a glyph substitute it in one place.
 */
import type { StudyMethod } from '../study/types.js';

export interface MethodReference {
  /** Short key cited by method entries, e.g. "USSA76". */
  readonly id: string;
  /** Full citation. */
  readonly text: string;
}

export interface MethodEntry {
  readonly id: string;
  readonly title: string;
  /** What the method does, in one to three sentences. */
  readonly summary: string;
  /** Formulas, one per line, in the symbols the summary and `symbols` explain. */
  readonly formulas: readonly string[];
  /** Symbol explanations, short. */
  readonly symbols?: string;
  /** Validity range and known limits, short. */
  readonly limits?: string;
  /** Reference ids (METHOD_REFERENCES). */
  readonly sources: readonly string[];
  /** The method write-up this entry condenses (path under docs/methods/). */
  readonly doc: string;
  /** Phrases that must appear in `doc` (kept in step by test/core/report/methods.test.ts). */
  readonly docAnchors: readonly string[];
}

export const METHOD_REFERENCES: readonly MethodReference[] = [
  { id: 'USSA76', text: 'U.S. Standard Atmosphere, 1976 (NOAA, NASA, USAF). Identical to ICAO Doc 7488, Manual of the ICAO Standard Atmosphere, below 32 km.' },
  { id: 'AN14', text: 'ICAO Annex 14, Aerodromes, Volume I: Aerodrome Design and Operations; 2.4.1-2.4.2 (aerodrome reference temperature), Table 1-1 (aerodrome reference code).' },
  { id: 'ADM1', text: 'ICAO Doc 9157, Aerodrome Design Manual, Part 1: Runways (percentage corrections for elevation, temperature and slope; read in secondary summaries).' },
  { id: 'HOR', text: 'Horonjeff, McKelvey, Sproule and Young, Planning and Design of Airports, 5th ed., McGraw-Hill, 2010; pp. 81, 84-88, 174-176, 191-194.' },
  { id: 'AHL63', text: 'Ahlborn and Horonjeff, "Effect of Gradient on Jet Transport Runway Lengths", ASCE Journal of the Aero-Space Transport Division 89(1), 1963, pp. 39-50.' },
  { id: 'AW', text: 'Ashford and Wright, Airport Engineering, 3rd ed., Wiley, p. 234 (older reference-temperature formula).' },
  { id: 'AC5325', text: 'FAA Advisory Circular 150/5325-4B, Runway Length Requirements for Airport Design, 2005 (gradient and wet-landing adjustments; read in secondary summaries).' },
  { id: 'AC5000', text: 'FAA Advisory Circular 150/5000-17, Critical Aircraft and Regular Use Determination, 2017 (regular use: 500 annual operations).' },
  { id: 'CFR25', text: '14 CFR Part 25, Airworthiness Standards: Transport Category Airplanes; 25.107, 25.109, 25.113, 25.121, 25.125.' },
  { id: 'CFR23', text: '14 CFR Part 23, Airworthiness Standards: Normal Category Airplanes; 23.51, 23.59 (pre-amendment 64), 23.2115, 23.2130.' },
  { id: 'CFR121', text: '14 CFR Part 121, Operating Requirements; 121.195 (landing limitations), 121.639 and 121.645 (fuel supply); 14 CFR 91.167.' },
  { id: 'CFR135', text: '14 CFR Part 135, Operating Requirements: Commuter and On Demand Operations; 135.385 (landing limitations, (f) eligible on-demand 80 %).' },
  { id: 'EUOPS', text: 'EU Air Operations Regulation (EU) No 965/2012, Annex IV (Part-CAT): CAT.POL.A.230, .235 (performance class A landing), CAT.POL.A.305, .325, .330 (class B takeoff and landing); rule numbers and percentages from memory.' },
  { id: 'AND', text: 'Anderson, Aircraft Performance and Design, McGraw-Hill, 1999; sections 5.3, 6.7, 6.8.' },
  { id: 'RAY', text: 'Raymer, Aircraft Design: A Conceptual Approach, AIAA; section 17.8 (takeoff analysis).' },
  { id: 'GUD', text: 'Gudmundsson, General Aviation Aircraft Design, Elsevier; chapters 17 (takeoff) and 22 (landing); propeller static thrust.' },
  { id: 'MAT', text: 'Mattingly, Heiser and Pratt, Aircraft Engine Design, 2nd ed., AIAA, 2002 (installed thrust lapse).' },
  { id: 'BY08', text: 'Bartel and Young, "Simplified Thrust and Fuel Consumption Models for Modern Two-Shaft Turbofan Engines", Journal of Aircraft, 2008.' },
  { id: 'GF', text: 'Gagg and Ferrar, piston-engine power lapse with density (as reproduced in secondary sources).' },
  { id: 'TOR', text: 'Torenbeek, Synthesis of Subsonic Airplane Design, Delft University Press, 1982; chapter 5, eq. 5-91.' },
  { id: 'ROS', text: 'Roskam, Airplane Design, Part I: Preliminary Sizing of Airplanes (takeoff parameters TOP23 and TOP25).' },
  { id: 'AEDB', text: "Aeronautical Engineer's Data Book, chapter 9 (Breguet range)." },
  { id: 'BRENT', text: 'Brent, Algorithms for Minimization without Derivatives, Prentice-Hall, 1973, chapter 4 (root finding).' },
  { id: 'NCEI', text: 'NOAA National Centers for Environmental Information: GHCN-Daily format description; Global Summary of the Month completeness rule; U.S. Climate Normals 1991-2020.' },
];

export const METHOD_ENTRIES: readonly MethodEntry[] = [
  {
    id: 'atmosphere',
    title: 'Atmosphere at the field',
    summary:
      'Pressure is the standard-atmosphere pressure at the pressure altitude (taken equal to the field elevation); ' +
      'density uses the actual design temperature. Density altitude is the standard altitude with that density.',
    formulas: [
      'T_ISA = T0 − L·H,   p = p0·(T_ISA/T0)^(g0/(R·L)),   g0/(R·L) = 5.255876',
      'ρ = p/(R·(T_ISA + ΔT)),   σ = ρ/ρ0',
      'H_ρ = (T0/L)·(1 − σ^(1/4.255876))',
    ],
    symbols: 'T0 = 288.15 K, p0 = 101 325 Pa, L = 0.0065 K/m, R = 287.0531 J/(kg·K), ΔT = design temperature − T_ISA.',
    limits: 'Geopotential altitude −610 to 20 000 m, −60 to 60 °C; dry air (humidity ignored).',
    sources: ['USSA76'],
    doc: 'atmosphere-climate-runway.md',
    docAnchors: ['5.255876', 'H_ρ = (T0/L)(1 − σ^(1/4.255876))', 'Dry air only'],
  },
  {
    id: 'design-temperature',
    title: 'Design temperature',
    summary:
      'The aerodrome reference temperature: the monthly mean of the daily maximum temperatures of the hottest month, ' +
      'the hottest month being the one with the highest monthly mean temperature. The month with the highest mean ' +
      'daily maximum is reported beside it and a difference between the two readings is flagged. From daily records, ' +
      'a month counts when at most 5 days (and at most 3 consecutive days) are missing.',
    formulas: [
      'ART = mean over the years of (mean daily maximum of the hottest month)',
      'hottest month = argmax over months of the monthly mean temperature (mean, or (max + min)/2)',
      'older textbook form: ART = Ta + (Tm − Ta)/3',
    ],
    symbols: 'Ta = mean of the daily average temperature of the hottest month; Tm = mean of its daily maximum.',
    limits: 'Should rest on several complete years; fewer than 5 years raises a warning.',
    sources: ['AN14', 'AW', 'NCEI'],
    doc: 'atmosphere-climate-runway.md',
    docAnchors: ['hottest month', 'Ta + (Tm − Ta)/3', 'at most 5 days are missing'],
  },
  {
    id: 'runway-geometry',
    title: 'Runway profile and declared distances',
    summary:
      'The effective gradient is the difference between the highest and lowest centreline elevations divided by the ' +
      'runway length; the design takeoff case uses the design runway\'s effective gradient as an uphill slope. ' +
      'Stopway and clearway follow from the declared distances.',
    formulas: [
      'G = (z_max − z_min)/L,   ΔH = z_max − z_min',
      'stopway = ASDA − TORA,   clearway = TODA − TORA',
    ],
    limits: 'Profile slopes are compared with the Annex 14 limits (warnings only).',
    sources: ['HOR', 'AN14'],
    doc: 'atmosphere-climate-runway.md',
    docAnchors: ['G = (z_max − z_min)/L', 'stopway = ASDA − TORA'],
  },
  {
    id: 'route',
    title: 'Design takeoff mass from the route',
    summary:
      'Each fleet row gives a stage length and payload. Fuel follows from the Breguet range equations with reserves ' +
      'carried (not burnt); the takeoff mass is capped by MTOW, fuel capacity, MLW at arrival and maximum payload. ' +
      'When a limit binds, the payload that must stay behind is reported. The same model gives the payload-range diagram.',
    formulas: [
      'jet: R = (V/c_T)·(L/D)·ln(W_i/W_f)     propeller: R = (η_p/c_P)·(L/D)·ln(W_i/W_f)',
      'W_ZF = OEW + payload;   W_TO = W_ZF·Φ(s),   arrival = W_ZF·Λ(s)',
      'W_TO ≤ MTOW,   fuel ≤ maximum fuel,   arrival ≤ MLW,   payload ≤ maximum payload',
    ],
    symbols: 'c_T = TSFC (1/s); c_P = BSFC·g (1/m); Φ, Λ grow with stage length s (closed form, no iteration).',
    limits: 'Climb and descent as one allowance (a fraction of the takeoff mass; engine-type default from common practice); no wind; constant L/D and consumption. Reserve policies follow 14 CFR 121.639 / 121.645 in simplified form, with a 200 NM alternate by default (common practice).',
    sources: ['AEDB', 'CFR121'],
    doc: 'route.md',
    docAnchors: ['R = (V / c_T) · (L/D) · ln(W_i / W_f)', 'W_TO    = A · x', '121.645(b)'],
  },
  {
    id: 'propulsion',
    title: 'Thrust and power at the site',
    summary:
      'Turbofan thrust lapses with Mach number and ambient conditions and is held up to a flat-rating corner that follows the rating ' +
      '(ISA + ΔT at the field, or a corner temperature falling with pressure altitude). ' +
      'Piston and turboprop shaft power lapse with density; propeller thrust runs from a static thrust set by a figure of merit to η·P/V in a smooth, decreasing blend.',
    formulas: [
      'turbofan: α = δ0·(1 − 0.49·√M) for θ0 ≤ TR, else δ0·(1 − 0.49·√M − 3·(θ0 − TR)/(1.5 + M))',
      'corner: TR = (T_c(Hp) + 273.15)/288.15,   T_c = T_ISA(Hp) + ΔT   or   T_c0 − lapse·Hp/1000',
      'piston: P/P0 = σ − (1 − σ)/7.55;   turboprop: P/P0 = min(1, (σ/σ_flat)^0.7)',
      'propeller: T_s = (FM·P)^(2/3)·(2·ρ·A)^(1/3),   A = π·D²/4;   T = η·P/V from V_b = 2·η·P/T_s, cubic blend below',
    ],
    symbols: 'θ0, δ0 = total temperature and pressure ratios; Hp = pressure altitude; FM = propeller figure of merit.',
    limits: 'Mach up to 0.4. The turboprop exponent and the default figures of merit (0.55 piston, 0.70 turboprop) are from memory.',
    sources: ['MAT', 'BY08', 'GF', 'GUD'],
    doc: 'takeoff.md',
    docAnchors: ['1 − 0.49√M', 'σ − (1 − σ)/7.55', 'T_s = (FM·P)^(2/3)·(2ρA)^(1/3)', 'ISA + ΔT form'],
  },
  {
    id: 'takeoff-ground',
    title: 'Takeoff ground run and airborne segment',
    summary:
      'The ground run integrates the equation of motion over speed (Gauss-Legendre quadrature), with ground effect, ' +
      'rolling friction on the wheel load, runway slope and wind; tailwheel aircraft start in a three-point phase. ' +
      'Rotation takes the profile\'s rotation time. With all engines the airborne segment is a transition arc and a climb to the screen ' +
      'height (35 ft transport and commuter, 50 ft others); with an engine out it is an energy method over height, with ground effect ' +
      'fading with height, gear retraction after lift-off and V2 reached by the screen height. Speeds follow 14 CFR 25.107 ' +
      '(VR at least 1.05 VMCA and V1; V2 floors). An average-force estimate at 0.7 VLOF is shown as a cross-check.',
    formulas: [
      'm·dV/dt = T − D − μ·(W·cosθ − L) − W·sinθ',
      'D = ½·ρ·V²·S·(C_D0 + φ·K·C_L²),   K = 1/(π·AR·e),   φ = (16h/b)²/(1 + (16h/b)²)',
      's = ∫ V dV / a;   cross-check s ≈ VLOF²/(2·a(0.7·VLOF))',
      'transition: R = V_TR²/(0.2·g),   V_TR = (VLOF + V2)/2,   sin γ = (T − D)/W',
      'engine out: x_air = ∫₀^H (1 + (1/2g)·d(V²)/dh) / ((T − D)/W) dh',
    ],
    limits: 'Point-mass, quasi-steady model; rotation as a time, not pitch dynamics. Engine-out air distances beyond 1,500 m are reported as a climb limit (project convention).',
    sources: ['RAY', 'GUD', 'AND'],
    doc: 'takeoff.md',
    docAnchors: ['m·dV/dt = T − D − μ·(W·cosθ − L) − W·sinθ', 'φ = (16h/b)²/(1 + (16h/b)²)', 'R = V_TR²/(0.2g)', 'x_air = ∫₀^H (1 + (1/2g)·d(V²)/dh) / ((T − D)/W) dh'],
  },
  {
    id: 'takeoff-engine-failure',
    title: 'Engine failure, balanced field and governing distance',
    summary:
      'For multi-engine aircraft the continued takeoff with the critical engine out and the accelerate-stop distance ' +
      '(recognition time, the activation time of the stopping means after V1, 2 s at V1, braking from the highest speed ' +
      'reached with idle thrust, no reverse) are computed for each V1; the balanced V1 is where they are equal, bounded by ' +
      'the minimum control speed, VR and, where given, the brake-energy limit. The certification basis decides the requirement.',
    formulas: [
      'transport and commuter: required = max(1.15 × all-engines distance to 35 ft, engine-out distance to 35 ft, accelerate-stop)',
      'accelerate-stop = run to V1 + activation (V1·t + ½·a·t²) + 2 s × V1 + braking to rest from V1 + a·t',
      'normal category: required = all-engines distance to 50 ft × light-aircraft factor',
    ],
    limits: 'Dry-runway certification rules on every surface (wet changes friction only); no reverse thrust. Default activation time 1 s (AC 25-7, from memory).',
    sources: ['CFR25', 'CFR23'],
    doc: 'takeoff.md',
    docAnchors: ['max(1.15 × all-engines to 35 ft, engine-out continued to 35 ft, accelerate-stop)', '2 s × V1'],
  },
  {
    id: 'climb',
    title: 'Engine-out climb gradient',
    summary:
      'The climb gradient at V2 with one engine inoperative (gear up, takeoff flaps; second segment) and at lift-off ' +
      'with the gear down (first segment) are compared with the minima of the certification basis. Below either the ' +
      'aircraft is climb-limited: the greatest mass that meets both is reported, and a longer runway cannot cure it.',
    formulas: [
      'sin γ = (T − D)/W at V2,   C_L = CLmax/(V2/VS1)²',
      'minimum gradient 2.4 / 2.7 / 3.0 % for 2 / 3 / 4 engines (transport; from memory); commuter 2.0 %',
      'first segment (gear down, VLOF): positive / 0.3 % / 0.5 % (transport; from memory)',
    ],
    sources: ['CFR25', 'AND'],
    doc: 'takeoff.md',
    docAnchors: ['2.4 / 2.7 / 3.0 %', 'a longer runway cannot cure it'],
  },
  {
    id: 'landing',
    title: 'Landing distance and required landing length',
    summary:
      'The landing distance from 50 ft is the sum of approach, flare, free roll and braking. The required length applies ' +
      'the study\'s operating rule set: under US Part 121 divide by 0.6 on a dry runway, 1.15 times that when wet for turbojets; ' +
      'Part 135 eligible on-demand divides by 0.8, Part 91 is unfactored, the EU commercial rules divide turboprops by 0.7 and add 15 % when wet for all types. ' +
      'Light aircraft take a planning factor of 1/0.7 on landing and 1.25 on takeoff unless the profile gives its own. ' +
      'Landing is computed at the landing mass, at ISA temperature unless the study chooses the design temperature.',
    formulas: [
      'VREF = vrefFactor × VSR0,   flare R = V_f²/(0.2·g),   free roll = N·V_TD',
      'braking s_b = 1/(2·g·J_A) · ln(1 + J_A·V_TD²/J_T)',
      'us-121: required = LD/0.60 (dry), × 1.15 wet turbojets, LD/0.70 turboprop alternate;   us-135-eod: LD/0.80;   us-91: LD',
      'eu-cat: LD/0.60 jets, LD/0.70 turboprops, × 1.15 wet all types;   light: LD × 1/0.7 (takeoff × 1.25) unless the profile sets a factor',
    ],
    symbols: 'J_T = μ_b·cosθ + sinθ − T_idle/W;  J_A = ρ·S·(C_D − μ_b·C_L)/(2·W).',
    limits: 'Reverse thrust never credited; no contaminated runways.',
    sources: ['AND', 'CFR25', 'CFR121', 'CFR135', 'EUOPS'],
    doc: 'landing-corrections-classification.md',
    docAnchors: ['s_b = 1/(2 g J_A) · ln(1 + J_A V_TD² / J_T)', 'dry LD / 0.60', 'dry LD / 0.80', 'takeoff × 1.25'],
  },
  {
    id: 'icao-corrections',
    title: 'Reference lengths with percentage corrections',
    summary:
      'Where an aircraft carries reference lengths (sea level, ISA), they are corrected step by step: elevation, ' +
      'temperature, then slope. If elevation and temperature together add more than 35 %, a specific study is required ' +
      'and the result is labelled indicative. The authority variant adds 10 m per m of centreline elevation difference.',
    formulas: [
      'L1 = L0·(1 + 0.07·E/300)',
      'L2 = L1·(1 + 0.01·(T_ref − T_std(E))),   T_std(E) = 15 − 0.0065·E',
      'flag when (L2 − L0)/L0 > 35 %;   L3 = L2·(1 + 0.10·G[%])  (L0 ≥ 900 m, from memory)',
      'authority: takeoff + 10·ΔH;   wet landing × 1.15 (turbojets)',
    ],
    limits: 'Indicative planning rules, not aircraft performance; tables are interpolated, never extrapolated.',
    sources: ['ADM1', 'AHL63', 'AC5325', 'HOR'],
    doc: 'landing-corrections-classification.md',
    docAnchors: ['L1 = L0 (1 + 0.07 E/300)', '(L2 − L0)/L0 > 35 %', '10 m per m'],
  },
  {
    id: 'empirical',
    title: 'Empirical cross-checks (indicative)',
    summary:
      'Statistical takeoff estimates are shown beside the physics result and never govern: Torenbeek\'s balanced field ' +
      'length for multi-engine aircraft and Roskam\'s takeoff parameters.',
    formulas: [
      'BFL = 0.863/(1 + 2.3·Δγ2)·((W/S)/(ρ·g·C_L2) + h_TO)·(1/(T̄/W − μ′) + 2.7) + 655 ft/√σ',
      'TOP25 = (W/S)/(σ·CLmax·T/W),   S_TOFL = 37.5·TOP25 ft',
    ],
    sources: ['TOR', 'ROS'],
    doc: 'takeoff.md',
    docAnchors: ['eq. 5-91', 'S_TOFL = 37.5·TOP25'],
  },
  {
    id: 'calibration',
    title: 'Calibration to a reference length',
    summary:
      'Where an aircraft carries a reference takeoff length (MTOW, sea level, ISA, dry, no wind or slope), one factor on ' +
      'thrust (or on takeoff CLmax) is fitted so that the performance model gives that length, and the tuned model is then ' +
      'run at the site. A factor outside the plausible band is refused and the uncalibrated model is used.',
    formulas: [
      'solve L_model(k) − L_ref = 0 for k in the band 0.7-1.3 (Brent; |residual| <= 0.05 m)',
      'landing: one factor on braking friction fitted to the reference landing length',
    ],
    limits: 'One factor matches one point; it cannot correct how the length grows with mass, elevation or temperature.',
    sources: ['BRENT'],
    doc: 'calibration-existing-runway.md',
    docAnchors: ['L_model(k) − L_ref = 0', '0.7–1.3', '0.05 m'],
  },
  {
    id: 'existing-runway',
    title: 'Existing runway: needs, greatest mass and penalties',
    summary:
      'At the design takeoff mass the needs are compared with the declared distances of each runway direction: takeoff ' +
      'run with TORA, takeoff distance with TODA, accelerate-stop with ASDA, landing with LDA. Where they do not fit, the ' +
      'greatest takeoff mass the declared distances (and the climb minimum) allow is found by bisection, and the route model ' +
      'turns it into a payload penalty on the design stage and a range penalty with the design payload.',
    formulas: [
      'TOD1 = 1.15·D35_AEO,  TOR1 = TOD1 − ½(TOD1 − 1.15·LOD_AEO);   TOD2 = D35_OEI,  TOR2 = TOD2 − ½(TOD2 − LOD_OEI)',
      'takeoff run max(TOR1, TOR2) <= TORA;   takeoff distance max(TOD1, TOD2) <= TODA;   accelerate-stop <= ASDA',
      'greatest mass: bisection on "all needs fit" between the lightest feasible mass and min(MTOW, climb-limited mass), 10 kg',
      'payload penalty = payload at MTOW − payload at the greatest mass (design stage);   range penalty = design stage − range',
    ],
    limits: 'Passenger penalties are rounded up to whole passengers in this appendix.',
    sources: ['HOR', 'CFR25', 'CFR121'],
    doc: 'calibration-existing-runway.md',
    docAnchors: ['TOD1 = 1.15·D35_AEO', 'Bisection', 'payloadAtMtow − payloadAtMass'],
  },
  {
    id: 'fleet',
    title: 'Regular use, critical aircraft and recommended length',
    summary:
      'Operations are counted per aircraft group; a group at or above the regular-use threshold is eligible. The ' +
      'critical aircraft is the eligible aircraft with the greatest required length (the greater of its takeoff and ' +
      'landing requirements); the recommended length is that requirement rounded up to the planning increment. The ' +
      'operations-served curve gives, for each length, the share of annual operations whose requirement fits.',
    formulas: [
      'required = max(takeoff requirement, landing requirement)',
      'recommended = increment × ceil(required_critical / increment)',
      'served(L) = Σ operations with required ≤ L / Σ operations',
    ],
    symbols: 'Regular use: 500 annual operations by default (a takeoff and a landing count one each).',
    sources: ['AC5000', 'HOR'],
    doc: 'landing-corrections-classification.md',
    docAnchors: ['returns the greater of the two'],
  },
  {
    id: 'plausibility',
    title: 'Plausibility bound',
    summary:
      'Near an aircraft\'s climb or thrust limit the takeoff model still returns a distance, which grows without limit ' +
      'as the climb gradient goes to zero. A requirement (or a physics distance behind it: all engines to the screen ' +
      'height; for transport and commuter categories engine-out continued takeoff, accelerate-stop, balanced field; ' +
      'or the landing) above the aircraft\'s ' +
      'bound is reported as "cannot practically operate here" with the reason, is never the critical aircraft, and ' +
      'gives no length in the sweeps, the what-if or the existing-runway check.',
    formulas: [
      'bound = max(2.5 × ARFL, 5500 m)',
      'impractical when any checked distance > bound',
    ],
    symbols: 'ARFL: aeroplane reference field length (the profile’s planning figure when it gives one, else the physics model at MTOW, sea level, ISA, dry; the appendix says which); an ARFL above 5500 m does not raise the bound.',
    limits: 'The factor 2.5 is a project convention (well beyond the 35 % at which the percentage corrections ask for a specific study); 5500 m is the length class of the longest paved runways (common practice, from memory).',
    sources: ['AN14', 'ADM1'],
    doc: 'study.md',
    docAnchors: ['bound = max(2.5 × ARFL, 5 500 m)', 'cannot practically operate here'],
  },
  {
    id: 'classification',
    title: 'Classification',
    summary:
      'ICAO aerodrome reference code: number from the aeroplane reference field length, letter from the wingspan. ' +
      'Aircraft approach category from VREF at MLW (sea level, ISA); airplane design group from tail height and ' +
      'wingspan, the more demanding governing.',
    formulas: [
      'code number 1 / 2 / 3 / 4: ARFL < 800 / < 1200 / < 1800 / ≥ 1800 m',
      'code letter A-F: span < 15 / 24 / 36 / 52 / 65 / 80 m',
      'approach category A-E: VREF < 91 / 121 / 141 / 166 / ≥ 166 kt',
    ],
    sources: ['AN14', 'HOR'],
    doc: 'landing-corrections-classification.md',
    docAnchors: ['A < 91, B < 121, C < 141', '< 80 m'],
  },
];

/** Plain-words name of a study's primary takeoff method, for the appendix. */
export const STUDY_METHOD_LABEL: Readonly<Record<StudyMethod, string>> = {
  physics: 'Performance model (first principles), with reference-length corrections shown beside it where data exist',
  'reference-icao': 'Reference lengths with the ICAO percentage corrections, the performance model shown beside them',
  'reference-authority': 'Reference lengths with the authority adjustments, the performance model shown beside them',
  calibrated: 'Performance model calibrated to each aircraft\'s reference length, then applied at the site',
  planning: 'Planning data first: the aircraft\'s planning chart where the design condition lies inside it; elsewhere the performance model calibrated to its planning chart or planning takeoff length; the uncalibrated model only for an aircraft without planning figures, and then flagged',
};

/** The references cited by `entries`, in the order of METHOD_REFERENCES. */
export function referencesFor(entries: readonly MethodEntry[]): readonly MethodReference[] {
  const cited = new Set(entries.flatMap((e) => e.sources));
  return METHOD_REFERENCES.filter((r) => cited.has(r.id));
}
