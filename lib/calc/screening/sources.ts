/**
 * The published sources and trade practice the bearing screen rests on, named in each reason it gives.
 * Section numbers marked "from memory" must be confirmed against the edition the jurisdiction adopted.
 */
export const SCREEN_SOURCES = {
  rafterTies:
    'IRC 2021 R802.5.2 ceiling joist and rafter connections (R802.3.1 before 2018): ceiling joists parallel to the rafters tie them and are lapped or joined where they meet over interior partitions; without ceiling joists or rafter ties the ridge is a beam designed by accepted engineering practice (section numbers from memory; confirm)',
  bracedWalls: 'IRC 2021 R602.10 wall bracing: braced wall lines and braced wall panels',
  purlins:
    'IRC 2021 R802.4.5 purlins: purlin braces carry the purlin down to a bearing wall (section number from memory; confirm)',
  trusses:
    'IRC 2021 R802.10 wood trusses: bearings are shown on the truss design drawings; trusses are not cut or altered without a registered design professional (from memory; confirm)',
  continuousJoists:
    'AWC Design Aid No. 6: a member continuous over two equal spans puts 1.25 wL on the centre support',
  commonPractice: 'Common practice (trade knowledge, not a code section)',
} as const;
