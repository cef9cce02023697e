/** Invented patterns for the batch tests: two good ones and one with a bead-count error. */
export const FAN = `title: Linnet Fan
designer: Tamsin Roe
beads: 8/0 round
colors:
  A #EDE6D3 bone
  B #3B5B3A moss
  C #B0413E brick

row 1: BBBB
row 2: *AAAA BA +AAA
row 3: *AAAA AB CC BA +AAA
row 4: *BBBB BA (AC CC)x2 +BBB
`;

export const TUBE = `title: Heron Tube
designer: Pell Okafor
layout: tube
colors:
  A #F4F1EA chalk
  B #2E6F8E teal
row 1: AAAA BBB AAA BB
rounds 2-3: BAA BB AA B
`;

/** Row 2, unit 2 takes 2 new beads; 3 are written. */
export const BROKEN = `title: Wren Band
colors:
  A #F4F1EA chalk
  B #2E6F8E teal
row 1: AAAA BBB AAA
row 2: BBB ABA BB
`;
