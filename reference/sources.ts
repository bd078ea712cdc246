import type { Source } from './types';

// One entry per document the tables lean on. Rows point at these objects so that edition and
// kind travel with every number. README.md lists the same set for people.

export const OSHA_1910_133: Source = {
	label: 'OSHA 29 CFR 1910.133(a)(5)',
	edition: '29 CFR 1910.133 as amended 2016 (table read from public copies of the CFR text)',
	kind: 'published'
};

export const ANSI_Z49_1_SHADE: Source = {
	label: 'ANSI Z49.1 / AWS F2.2 lens shade guide (suggested comfort shade)',
	edition: 'ANSI Z49.1:2012 and AWS F2.2:2001 (R2010), as reprinted in equipment manuals',
	kind: 'published'
};

export const ASME_IX_QW_409_1: Source = {
	label: 'ASME BPVC Section IX QW-409.1(a)',
	edition: 'BPVC IX 2019 and later',
	kind: 'published',
	note: 'Heat input = V x A x 60 / travel speed; no efficiency factor.'
};

export const ISO_TR_17671_1: Source = {
	label: 'ISO/TR 17671-1 (EN 1011-1) thermal efficiency factor k',
	edition: 'ISO/TR 17671-1:2002; EN 1011-1:2009 Table 1',
	kind: 'published'
};

export const ASME_IX_QW_451_1: Source = {
	label: 'ASME BPVC Section IX QW-451.1',
	edition: 'BPVC IX 2010 through 2021 (rows unchanged as far as known)',
	kind: 'published',
	note: 'Groove-weld tension and transverse-bend tests; table notes beyond the t >= 3/4 in rule are not modelled.'
};

export const ASME_IX_QW_461_9: Source = {
	label: 'ASME BPVC Section IX QW-461.9',
	edition: 'BPVC IX 2010 through 2021 (rows unchanged as far as known)',
	kind: 'published'
};

export const ASME_IX_QW_452_1B: Source = {
	label: 'ASME BPVC Section IX QW-452.1(b)',
	edition: 'BPVC IX 2010 with 2011a addenda (read from a public copy)',
	kind: 'published'
};

export const ASME_IX_QW_452_3: Source = {
	label: 'ASME BPVC Section IX QW-452.3',
	edition: 'BPVC IX 2010s editions, as quoted in public training notes',
	kind: 'published',
	note: '2-7/8 in (73 mm) OD is the equivalent of NPS 2-1/2 (DN 65).'
};

export const ASME_IX_QW_403_10: Source = {
	label: 'ASME BPVC Section IX QW-403.10 and QW-404.32 (GMAW short-circuit)',
	edition:
		'as stated in API RP 577 (Welding Processes, Inspection, and Metallurgy) 11.3, "Lack of fusion with GMAW-S", read from a public reproduction of its text',
	kind: 'published',
	note: "Coupon under 1/2 in (12.7 mm) welded short-circuit: base metal qualified up to 1.1 times the coupon thickness (QW-403.10), deposit up to 1.1 times the deposit (QW-404.32). Beadline uses the code's 13 mm metric column."
};

export const ASME_IX_QW_422: Source = {
	label: 'ASME BPVC Section IX QW/QB-422 (P-Numbers)',
	edition: 'BPVC IX 2017 (read from a public copy of the table)',
	kind: 'published'
};

export const ASME_IX_QW_422_MEMORY: Source = {
	label: 'ASME BPVC Section IX QW/QB-422 (P-Numbers)',
	edition: 'recalled, no copy at hand',
	kind: 'from memory'
};

export const ASME_IX_QW_422_2013_AL: Source = {
	label: 'ASME BPVC Section IX QW/QB-422 (P-Numbers), aluminium fittings rows',
	edition:
		'BPVC IX 2013, the B361 fittings rows read from a public copy of the table (anyflip.com/pegaz/aval/basic/251-300)',
	kind: 'published',
	note: 'WP1100 P-21, WP3003 P-21, 5083 P-25, 5154 P-22, WP6061 P-23, WP6063 P-23 (fittings). Rows for the same alloys under other product specifications (B209 sheet and plate, B221 extrusions) were not read.'
};

export const ASME_IX_QW_432: Source = {
	label: 'ASME BPVC Section IX QW-432 (F-Numbers)',
	edition: 'BPVC IX 2010s editions (specification-to-F-Number grouping read from a public chart)',
	kind: 'published'
};

export const ASME_IX_QW_432_MEMORY: Source = {
	label: 'ASME BPVC Section IX QW-432 (F-Numbers)',
	edition: 'recalled, no copy at hand',
	kind: 'from memory'
};

export const AWS_D1_2_FILLER_GROUPS: Source = {
	label: 'AWS D1.2/D1.2M:2014 Clause 3 filler metal groups F21 to F25 (aluminium)',
	edition:
		'D1.2/D1.2M:2014, the filler metal group table of Clause 3 read from a public copy of the page (scribd.com/document/528227606)',
	kind: 'published',
	note: 'F21: ER1100, ER1188; F22: ER5183, ER5356, ER5554, ER5556, ER5654; F23: ER4010, ER4043, ER4047, ER4145, ER4643; F24: ER4009 and cast rods; F25: ER2319. These are the group numbers of the ASME IX QW-432 aluminium F-Numbers; the QW-432 alloy rows themselves were not read, so for ASME work QW-432 governs where the two differ.'
};

export const ASME_IX_QW_442: Source = {
	label: 'ASME BPVC Section IX QW-442 (A-Numbers)',
	edition: 'BPVC IX; A-1 for A5.18 carbon steel wire as given in the project brief',
	kind: 'published'
};

export const ASME_IX_QW_442_MEMORY: Source = {
	label: 'ASME BPVC Section IX QW-442 (A-Numbers)',
	edition: 'recalled, no copy at hand; the A-Number really follows the deposit analysis',
	kind: 'from memory'
};

export const ISO_15614_1_TABLE_A1: Source = {
	label: 'ISO 15614-1:2017 Annex A Table A.1 (level 1 F-Numbers of covered electrodes)',
	edition:
		'BS EN ISO 15614-1:2017+A1:2019, read from a text copy of the standard; column B (classification by tensile strength) uses the AWS A5.1 digits',
	kind: 'published',
	note: 'F-1: EXX20, EXX24, EXX27, EXX28; F-2: EXX12, EXX13, EXX14, EXX19; F-3: EXX10, EXX11; F-4: EXX15, EXX16, EXX18, EXX48. Level 1 is the ASME IX based level, so these are the QW-432 groups. EXX22 is not listed there.'
};

export const ISO_15614_1_TABLE_A2: Source = {
	label: 'ISO 15614-1:2017 Annex A Table A.2 (level 1 A-Numbers by weld metal analysis)',
	edition: 'BS EN ISO 15614-1:2017+A1:2019, read from a text copy of the standard',
	kind: 'published',
	note: 'The twelve QW-442 analysis ranges: A-1 mild steel (C 0.20, Cr 0.20, Mo 0.30, Ni 0.50, Mn 1.60, Si 1.00 max); A-3 Cr 0.40-2.00, Mo 0.40-0.65; A-8 Cr 14.50-30.00, Ni 7.50-15.00, Mo 4.00 max. Applied here to the nominal composition of the classification; the deposit analysis decides.'
};

export const AWS_A5_CLASSIFICATION: Source = {
	label: 'AWS A5 filler metal classification system (A5.1, A5.9, A5.10, A5.18, A5.20, A5.28)',
	edition: 'A5.18/A5.18M:2005 and the other A5 specifications of that period',
	kind: 'published'
};

export const AWS_A5_12: Source = {
	label: 'AWS A5.12/A5.12M tungsten electrode classifications',
	edition: 'A5.12/A5.12M:2009 (names and oxide contents)',
	kind: 'published'
};

export const TUNGSTEN_CHART_A: Source = {
	label: 'Equipment maker chart A: tungsten current ranges (composite of AWS and electrode makers)',
	edition: 'operating manual table dated 1988',
	kind: 'common practice',
	note: 'Same numbers as the project brief for 2 % Th / Ce / La.'
};

export const TUNGSTEN_CHART_B: Source = {
	label: 'Equipment maker chart B: tungsten current ranges',
	edition: 'inverter TIG operating manual, 2010s',
	kind: 'common practice'
};

export const WIRE_CHART_BRIEF: Source = {
	label: 'Solid wire amperage by diameter and transfer (equipment data)',
	edition: 'values as collected in the project brief',
	kind: 'common practice'
};

export const WFS_PER_AMP: Source = {
	label: 'Wire feed speed per amp (small GMAW machine manuals)',
	edition: 'operating manuals 2010s; 0.045 in value from the project brief',
	kind: 'common practice'
};

export const GTAW_ROD_CHART: Source = {
	label: 'GTAW filler rod diameter by amperage (shop chart)',
	edition: 'values as collected in the project brief',
	kind: 'common practice'
};

export const SMAW_ELECTRODE_CHART: Source = {
	label: "Machinery's Handbook Table 14, current ranges for SMAW E70XX electrodes (E7018 column)",
	edition:
		"Machinery's Handbook, 31st edition (Industrial Press, 2020), Shielded Metal Arc Welding, Table 14, p. 1594, read in a public flipbook copy (online.flippingbook.com/view/954046886/114)",
	kind: 'common practice',
	note: 'E7018: 3/32 in 70-105 A, 1/8 in 110-160 A, 5/32 in 150-215 A, 3/16 in 180-275 A; the handbook puts the best starting point mid-range. Typical ranges: the electrode maker\u2019s data sheet for the box in use governs.'
};

export const THICKNESS_RULE: Source = {
	label: 'Rule of thumb: about 1 A per 0.001 in of thickness (GTAW, carbon steel)',
	edition: 'shop practice; also printed in small machine manuals',
	kind: 'common practice',
	note: 'Stainless about 10 % lower, aluminium on AC about 20-30 % higher.'
};

export const GMAW_THICKNESS_BANDS: Source = {
	label: 'GMAW amperage by thickness band (compiled for Beadline from typical shop charts)',
	edition: 'Beadline 2025',
	kind: 'common practice'
};

export const GAS_FLOW_PRACTICE: Source = {
	label: 'Shielding gas flow ranges (shop practice and a welding textbook table)',
	edition: 'values as collected in the project brief',
	kind: 'common practice'
};

export const GAS_FLOW_FCAW_TEXTBOOK: Source = {
	label: 'Shielding gas flow for gas-shielded flux-cored wire (FCAW-G), carbon and low-alloy steel',
	edition:
		'Modern Welding (Goodheart-Willcox, 2020), Figure 8-35 and the text beside it, p. 214, read in the publisher\u2019s online textbook (g-wonlinetextbooks.com/modern-welding-2020/236)',
	kind: 'common practice',
	note: 'FCAW-G flows are similar to GMAW\u2019s; Figure 8-35, carbon and low-alloy steels: 1/16 in 25, 1/8 in 25, 1/4 in 30, 3/8 in 35, 3/4 in 50 ft3/h. Out of position add 10-20 ft3/h. Adjust to the nozzle and its distance from the work.'
};

export const GAS_FLOW_MEMORY: Source = {
	label: 'Shielding gas flow for helium-rich mixes and gas-shielded FCAW',
	edition: 'recalled',
	kind: 'from memory'
};

export const GAS_MIX_PRACTICE: Source = {
	label: 'Common shielding gas mixes and what they suit',
	edition: 'shop practice',
	kind: 'common practice'
};

export const IIW_CE: Source = {
	label: 'IIW carbon equivalent CE(IIW)',
	edition: 'IIW formula as used in EN 1011-2 and AWS D1.1 Annex H',
	kind: 'published'
};

export const CE_GUIDANCE: Source = {
	label: 'Carbon equivalent preheat guidance (CE up to 0.40 usually none)',
	edition: 'shop practice',
	kind: 'common practice'
};

export const AWS_D1_1_TABLE_3_3: Source = {
	label: 'AWS D1.1/D1.1M:2015 Table 3.3, Category B',
	edition: 'D1.1/D1.1M:2015 (Table 5.8 in the 2020 edition)',
	kind: 'published',
	note: 'SMAW with low-hydrogen electrodes, SAW, GMAW, FCAW.'
};

export const AWS_D1_1_TABLE_4_5: Source = {
	label: 'AWS D1.1/D1.1M:2015 Table 4.5 (PQR changes requiring requalification)',
	edition: 'D1.1/D1.1M:2015 (table numbers change between editions)',
	kind: 'published'
};

export const CONTINUITY_SOURCES: Source = {
	label: 'ASME BPVC IX QW-322.1(a); AWS D1.1 welder period of effectiveness; ISO 9606-1 9.2',
	edition: 'BPVC IX 2019+; D1.1/D1.1M:2015 4.2.3.1; ISO 9606-1:2012',
	kind: 'published',
	note: 'Six months without using the process; ISO asks for a confirmation every six months.'
};

export const INCH_EXACT: Source = {
	label: '1 in = 25.4 mm exactly (NIST Handbook 44 Appendix C; 16 CFR 500.19)',
	edition: 'NIST HB 44 (current); 16 CFR 500.19',
	kind: 'published'
};

export const MSG_SHEET_STEEL: Source = {
	label: "Manufacturers' Standard Gauge for uncoated sheet steel",
	edition: 'weights of the 1893 U.S. Standard Gauge (15 U.S.C. 206) at 41.82 lb/ft2 per inch',
	kind: 'published',
	note: 'Values checked against published charts for 10, 14, 16, 18, 20, 21, 24 and 28 ga.'
};

export const AWG_ALUMINIUM: Source = {
	label: 'Brown & Sharpe / AWG gauge (aluminium and other non-ferrous sheet)',
	edition: 'ASTM B258 definition: d = 0.005 x 92^((36 - n) / 39) in',
	kind: 'published'
};

export const BWG_TUBE: Source = {
	label: 'Birmingham Wire Gauge (BWG) for tube wall',
	edition:
		"Holtzapffel's measured BWG table (Mechanical Manipulation, reprinted at chestofbooks.com) and the Engineering ToolBox BWG table; gauges 8-26 agree with both",
	kind: 'published'
};

export const POLARITY_PRACTICE: Source = {
	label: 'Current type and polarity by process and base metal',
	edition: 'shop practice',
	kind: 'common practice'
};

/** What a record is checked against when it names a procedure: the revision's own ranges. */
export const PROCEDURE_RANGES: Source = {
	label: 'The procedure (WPS) ranges',
	edition: 'the revision the record is checked against',
	kind: 'published'
};

// ---- ISO and EN texts (issue 15). The ISO standards are copyright texts with no public copy at
// hand: their rows are recalled and marked so, except where a public page quoted the clause.

export const ISO_15614_1_RANGES: Source = {
	label: 'ISO 15614-1 clause 8 (range of qualification), readings not in the text',
	edition:
		'ISO 15614-1:2017+A1:2019, recalled: that sub-group 1.4 (weather-resistant steels) qualifies itself only; Table 5 does not name sub-groups of group 1',
	kind: 'from memory',
	note: 'Level 2 rows. Verify these in the standard before relying on them.'
};

export const ISO_15614_1_2017: Source = {
	label: 'ISO 15614-1:2017+A1:2019 clause 8 (range of qualification), level 2',
	edition:
		'BS EN ISO 15614-1:2017+A1:2019 (identical to ISO 15614-1:2017 with Amd 1:2019) and UNI EN ISO 15614-1:2017, read from text copies of the standard: 8.3.1 Table 5, 8.3.2 Table 7, 8.3.3 Table 9, 8.4.1-8.4.11, 8.5.2, Annex A Tables A.1 and A.2',
	kind: 'published',
	note: 'Level 2 columns. Table 7: t <= 3 one cell across the levels, 0.5t to 2t; 3 < t <= 12 single run 0.5t (3 min) to 1.3t, multi-run 3 to 2t; 12 < t <= 40 single run 0.5t to 1.1t; 12 < t <= 100 multi-run 0.5t to 2t; 40 < t <= 100 no single-run row; over 100 mm multi-run 50 to 2t. Table 9: D qualifies 0.5D and over. 8.4.8: preheat may drop 50 degC; 8.4.9: interpass may rise 50 degC (groups 8, 10, 41-48: the highest reached).'
};

export const ISO_15614_1_LEVELS: Source = {
	label: 'ISO 15614-1:2017 levels 1 and 2 (BS EN ISO 15614-1:2017 national foreword)',
	edition: 'BS EN ISO 15614-1:2017, national foreword, read from a public copy',
	kind: 'published',
	note: 'Level 1 is based on ASME IX, level 2 on the 2004 edition; a level 2 test also qualifies level 1, not the reverse; with no level specified, level 2 applies.'
};

export const ISO_TR_15608: Source = {
	label: 'ISO/TR 15608 material grouping system (steels)',
	edition: 'ISO/TR 15608:2017, group names recalled',
	kind: 'from memory',
	note: 'Groups 1 to 6 and sub-groups 1.1 to 1.4 read the same in the CR ISO 15608:2000 text (public copy); the 2017 names of groups 7 to 11 were not read, and a public summary of the grouping gives group 8 as Ni 31 % at most, not the 35 % recalled for 2017.'
};

export const ISO_9606_1_RANGES: Source = {
	label: 'ISO 9606-1 clause 5 (range of qualification), readings not in the text',
	edition:
		'ISO 9606-1:2012, recalled: that H-L045 and J-L045 also qualify the fixed-pipe position of their direction (PH, PJ), which Table 9 has no column for',
	kind: 'from memory',
	note: 'Verify in the standard before relying on it.'
};

export const ISO_9606_1_2012: Source = {
	label: 'ISO 9606-1:2012 clause 5 (essential variables and range of qualification)',
	edition:
		'BS EN ISO 9606-1:2017 (identical to ISO 9606-1:2012 with Cor 1:2012), read from a text copy of the standard: 5.2, 5.3, 5.4, 5.5 Tables 2 and 3, 5.7 Tables 6, 7 and 8, 5.8 Tables 9 and 10',
	kind: 'published',
	note: 'Table 6 (deposited thickness, butt): s < 3: s to 3 or 2s, whichever is greater; 3 <= s < 12: 3 to 2s; s >= 12: 3 and over. Table 7: D <= 25: D to 2D; D > 25: 0.5D, 25 mm min. Table 8 (fillet): t < 3: t to 2t or 3, whichever is greater; t >= 3: 3 and over. 5.5.2: any filler group also qualifies parent groups 1 to 11. 5.2: 135/138 and 121/125 cover each other; 141, 143, 145 qualify 141, 142, 143, 145; 142 only itself. The comparison signs of 5.3 were not legible in the copy.'
};

export const ISO_9606_1_FILLET_SUPPLEMENT: Source = {
	label: 'ISO 9606-1:2012 5.4: supplementary fillet test (10 mm, single layer, PB)',
	edition: 'ISO 9606-1:2012, as quoted by a certification body (dekra.se, ISO 9606-1 page)',
	kind: 'published'
};

export const ISO_9606_1_VALIDITY: Source = {
	label: 'ISO 9606-1:2012 9.2 (six-month confirmation) and 9.3 a), b), c) (revalidation)',
	edition:
		'ISO 9606-1:2012, as quoted by certification bodies (thewdc.co.uk 2021, dekra.se, necitservices.com)',
	kind: 'published',
	note: '9.3 a) retest every 3 years; b) every 2 years, two production welds of the last 6 months tested volumetrically or destructively; c) valid while confirmed every 6 months, same manufacturer with ISO 3834-2 or -3 and documented acceptable welds. Route c) is not accepted for PED categories II-IV.'
};

export const ISO_6947: Source = {
	label:
		'ISO 6947 welding positions (PA to PH, PJ, H-L045, J-L045) and their ASME/AWS test positions',
	edition:
		'ISO 6947:2011 Annex B (informative), Table B.1, read in GOST R ISO 6947-2017, a national adoption identical to ISO 6947:2011 (docs.cntd.ru/document/1200144942): 1G PA, 2G PC, 3G uphill PF, 3G downhill PG, 4G PE, 5G uphill PH, 5G downhill PJ, 6G uphill H-L045, 6G downhill J-L045, 1F PA, 1FR PA, 2F PB. 3F PF/PG read in a public course presentation on welding positions (2005), 4F PD in a public position chart citing BS EN ISO 15614-1, ASME IX and AWS D1.1; 6GR welded up, H-L045, read in an AWS underwater welding specification\u2019s test position figure (D3.6M Figure 5.4, public reprint)',
	kind: 'published',
	note: 'Annex B compares the designations; a qualification is still judged by the code it is made to.'
};

/** The two ASME/AWS rows of the ISO 6947 table whose equivalent was not read (2FR, 5F). */
export const ISO_6947_RECALLED: Source = {
	label: 'ISO 6947 equivalents of 2FR and 5F',
	edition:
		'recalled: 2FR (pipe rotated, horizontal fillet) as PB, 5F (pipe fixed, fillet) as PH up / PJ down; the rows of Table B.1 after 2F were not read',
	kind: 'from memory',
	note: 'Verify in ISO 6947:2011 Annex B before relying on it.'
};

export const EN_1011_2_CET: Source = {
	label: 'EN 1011-2 Annex C.3 (method B): CET and preheat Tp',
	edition:
		'EN 1011-2:2001 (ISO/TR 17671-2:2002); formula checked against a public reprint (indugrid.net, weld preheat calculator)',
	kind: 'published',
	note: 'CET = C + (Mn+Mo)/10 + (Cr+Cu)/20 + Ni/40; Tp = 697 CET + 160 tanh(d/35) + 62 HD^0.35 + (53 CET - 32) Q - 328 (degC, d mm, HD ml/100 g, Q kJ/mm).'
};

export const EN_1011_2_CET_LIMITS: Source = {
	label: 'EN 1011-2 Annex C.3: validity ranges of the CET method',
	edition: 'EN 1011-2:2001, recalled',
	kind: 'from memory',
	note: 'CET 0.2-0.5 %, d 10-90 mm, HD 1-20 ml/100 g, Q 0.5-4.0 kJ/mm, C 0.05-0.32 %.'
};

export const EN_1011_2_HYDROGEN_SCALES: Source = {
	label: 'EN 1011-2 Annex C.2 hydrogen scales A to E and combined thickness',
	edition:
		'EN 1011-2:2001 Table C.2 and C.2.4, as reprinted on a public preheat page (gowelding.com/weld/preheat/preheatinfo.htm); C.2.4 as the clause of combined thickness read in BS EN 1011-2:2001+A1:2003 (Table C.1 title, epage.pub copy)',
	kind: 'published',
	note: 'A > 15; B 10-15; C 5-10; D 3-5; E <= 3 ml/100 g deposited metal. Combined thickness: the thicknesses of all paths taking heat from the weld, added (a butt weld of two equal plates twice the plate, a T fillet three times).'
};

export const AWS_D1_1_QUALIFICATION: Source = {
	label: 'AWS D1.1/D1.1M WPS qualification ranges (Tables 4.1 and 4.2 in 2015; Clause 6 in 2020)',
	edition: 'D1.1/D1.1M:2015, rows recalled',
	kind: 'from memory',
	note: 'Verify in the edition the contract names.'
};

export const AWS_D1_1_TABLE_9_10: Source = {
	label: 'AWS D1.1/D1.1M:2015 Table 9.10 (WPS qualification, CJP groove welds on pipe or tubing)',
	edition:
		'D1.1/D1.1M:2015, Table 9.10 read from a public copy of the two pages (ro.scribd.com/document/435989338)',
	kind: 'published',
	note: 'Job-size test pipes: a test under 24 in qualifies the test diameter and over; 24 in and over qualifies 24 in and over. Standard test pipes (2 in Sch 80 or 3 in Sch 40; 6 in Sch 120 or 8 in Sch 80) have their own rows.'
};

export const AWS_D1_1_GMAW_S: Source = {
	label: 'AWS D1.1/D1.1M 3.2.2: GMAW-S is not prequalified; its WPS is qualified by test',
	edition:
		'D1.1:2000 3.2.2 and D1.1/D1.1M:2015 notes to Figures 3.2 and 3.3, read from public copies',
	kind: 'published',
	note: 'The Table 4.5 essential variable limits for GMAW also apply to GMAW-S.'
};

export const ASME_IX_QW_255_256: Source = {
	label: 'ASME BPVC Section IX QW-255 (GMAW, FCAW) and QW-256 (GTAW) variable tables',
	edition:
		'BPVC IX 2004 with 2005 addenda and 2019, as reproduced in public WPS/PQR review checklists',
	kind: 'published',
	note: 'E = essential, S = supplementary essential (when toughness testing applies), N = nonessential.'
};

// ---- ISO filler designations beside AWS classifications (issue 15) ----

export const ISO_14343_GUIDE: Source = {
	label: 'Guide to EN ISO 14343 – A, B: classification examples',
	edition: 'ISO 14343:2009 as summarised in a public guide (html.pdfcookie.com; 1library.net copy)',
	kind: 'published',
	note: 'Gives G 19 12 3 L Si (system A) with SS316LSi (system B), and G 20 10 3 with SS308Mo, as one wire.'
};

export const AWS_A5_9_2017: Source = {
	label: 'AWS A5.9/A5.9M:2017 (ISO 14343:2009 MOD), title page',
	edition: 'A5.9/A5.9M:2017, public copy of the title page (studylib.net)',
	kind: 'published',
	note: 'A5.9 is ISO 14343 modified: its ER alloy types are the system B alloy types of ISO 14343.'
};

export const ISO_14341_GUIDE: Source = {
	label: 'Guide to EN ISO 14341 – A: Table 3 wire chemistry',
	edition: 'ISO 14341 as summarised in a public guide (studylib.net)',
	kind: 'published',
	note: 'G3Si1: Mn 1.30-1.60, Si 0.70-1.00 %; G4Si1: Mn 1.60-1.90, Si 0.80-1.20 %.'
};

export const ALUMINIUM_FILLER_SHEETS: Source = {
	label:
		'Filler maker\u2019s product data sheets: aluminium 4043 and 5356 wire and rod, ISO designation',
	edition:
		'published product sheets of one US aluminium filler maker, read in issue 15 (titles and addresses in reference/README.md)',
	kind: 'common practice',
	note: 'The 4043 sheet gives the ISO designation AlSi5, the 5356 sheet AlMg5Cr(A); both state AWS A5.10. One maker\u2019s certification of its own wire: read the certificate of the wire in use.'
};

export const ISO_FILLER_MEMORY: Source = {
	label: 'ISO filler designation beside the AWS classification (recalled)',
	edition:
		'ISO 14341, ISO 636, ISO 14343, ISO 18273 as recalled; no public correspondence table read',
	kind: 'from memory',
	note: 'A wire is certified to each standard on its own: read the maker\u2019s certificate.'
};
