import { textPath, type DemoDocument, type DemoGroup, type DemoLayer } from './demo-layers';

// "Lantern Walk", the autumn collection in drafting: 5 x 7 in at 300 PPI.
const W = 1500;
const H = 2100;
const BROWN = '#3b2a2a';

type FoxStyle = { name: string; x: number; y: number; scale: number; scarf: string; stripe: string };

// a fox walking right with a lantern on a stick; local box 620 x 520
function fox(style: FoxStyle): DemoGroup {
  const at = (body: string) => `<g transform="translate(${style.x},${style.y}) scale(${style.scale})">${body}</g>`;
  const layer = (name: string, body: string, extra: Partial<DemoLayer> = {}): DemoLayer => ({ name, svg: at(body), ...extra });
  const stripes = [0, 1, 2, 3].map((i) => `<rect x="${318 + i * 22}" y="250" width="10" height="60"/>`).join('');
  return {
    name: style.name,
    children: [
      layer('Tail', `<path d="M150,370 C40,380 0,250 70,190 C90,260 140,300 200,320 Z" fill="#e07a3a"/>
        <path d="M70,190 C40,215 38,262 58,292 C70,250 80,220 70,190 Z" fill="#fbefe0"/>`),
      layer('Legs', `<g fill="${BROWN}"><rect x="150" y="400" width="30" height="100" rx="14"/><rect x="200" y="410" width="30" height="95" rx="14"/>
        <rect x="290" y="405" width="30" height="100" rx="14"/><rect x="340" y="395" width="30" height="105" rx="14"/></g>`),
      layer('Body', `<ellipse cx="260" cy="355" rx="135" ry="85" fill="#e8823a"/>`),
      layer('Chest', `<ellipse cx="350" cy="350" rx="50" ry="62" fill="#fbefe0"/>`),
      layer('Head', `<path d="M320,210 C335,140 430,135 455,200 L530,250 C500,282 445,292 400,288 C350,284 318,255 320,210 Z" fill="#e8823a"/>`),
      layer('Ears', `<path d="M345,170 L358,95 L400,150 Z M405,150 L440,88 L455,170 Z" fill="#e8823a"/>
        <path d="M352,150 L358,110 L380,140 Z M415,140 L438,104 L445,155 Z" fill="${BROWN}"/>`),
      layer('Muzzle', `<path d="M420,240 C460,246 500,250 530,250 C500,280 450,290 410,282 C400,268 405,250 420,240 Z" fill="#fbefe0"/>
        <circle cx="530" cy="250" r="10" fill="${BROWN}"/>`),
      layer('Eye', `<path d="M402,212 Q415,222 428,212" stroke="${BROWN}" stroke-width="6" fill="none" stroke-linecap="round"/>`),
      layer('Scarf', `<path d="M325,255 C360,285 420,285 452,260 L458,290 C420,312 358,312 320,285 Z" fill="${style.scarf}"/>
        <path d="M340,290 L330,360 L360,362 L366,296 Z" fill="${style.scarf}"/>`),
      layer('Scarf stripes', `<g fill="${style.stripe}">${stripes}<rect x="328" y="320" width="40" height="10"/><rect x="326" y="342" width="40" height="10"/></g>`, { clipping: true }),
      layer('Lantern stick', `<path d="M440,270 L612,120" stroke="#6b4a2e" stroke-width="10" stroke-linecap="round"/>
        <path d="M605,126 L605,180" stroke="${BROWN}" stroke-width="4"/>`),
      layer('Lantern', `<rect x="575" y="180" width="60" height="88" rx="12" fill="#ffd76a"/>
        <rect x="575" y="180" width="60" height="88" rx="12" fill="none" stroke="${BROWN}" stroke-width="8"/>
        <path d="M570,182 L640,182 L625,164 L585,164 Z M578,268 L632,268 L622,282 L588,282 Z" fill="${BROWN}"/>
        <path d="M605,200 C590,220 598,240 605,248 C612,240 620,220 605,200 Z" fill="#f08a24"/>`),
    ],
  };
}

function leaf(name: string, x: number, y: number, angle: number, size: number, colour: string, oak: boolean): DemoLayer {
  const shape = oak
    ? 'M0,-40 C14,-34 8,-24 18,-20 C28,-14 16,-4 24,2 C32,10 16,18 16,26 C12,34 4,36 0,42 C-4,36 -12,34 -16,26 C-16,18 -32,10 -24,2 C-16,-4 -28,-14 -18,-20 C-8,-24 -14,-34 0,-40 Z'
    : 'M0,-42 C26,-22 26,20 0,42 C-26,20 -26,-22 0,-42 Z';
  return {
    name,
    svg: `<g transform="translate(${x},${y}) rotate(${angle}) scale(${size})"><path d="${shape}" fill="${colour}"/>
      <path d="M0,-36 L0,48" stroke="#7a3b1d" stroke-width="3" opacity="0.7"/></g>`,
  };
}

export function lanternWalk(): DemoDocument {
  const stars = Array.from({ length: 40 }, (_, i) => `<circle cx="${(i * 233) % W}" cy="${60 + ((i * 137) % 700)}" r="${2 + (i % 3)}" fill="#f6eac8" opacity="0.8"/>`).join('');
  const foxes = [
    { name: 'Fox with Lantern', x: 180, y: 1330, scale: 1.15, scarf: '#2a9d8f', stripe: '#f6eac8' },
    { name: 'Little Fox with Lantern', x: 820, y: 1500, scale: 0.8, scarf: '#d6453d', stripe: '#f6c744' },
  ];
  // lantern centre in local fox coordinates is (605, 224)
  const glowAt = foxes.map((f) => [f.x + 605 * f.scale, f.y + 224 * f.scale, 260 * f.scale]);
  const leaves = [
    ['Oak leaf', 260, 820, 20, 1.6, '#d9822b', true], ['Birch leaf', 520, 1020, -35, 1.2, '#f2b134', false],
    ['Beech leaf', 900, 760, 60, 1.4, '#c4492c', false], ['Oak leaf small', 1240, 980, -15, 1.1, '#e0a030', true],
    ['Rowan leaf', 1100, 1260, 110, 1.3, '#b83a2a', false], ['Maple-ish leaf', 380, 1260, -70, 1.5, '#e5673a', true],
    ['Drifting leaf', 1390, 1420, 40, 1.2, '#f2b134', false], ['Last leaf', 640, 1880, -20, 1.3, '#c4492c', true],
  ] as const;
  return {
    width: W,
    height: H,
    ppi: 300,
    children: [
      { name: 'Background', svg: `<defs><linearGradient id="dusk" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#1f2a4a"/>
        <stop offset="0.55" stop-color="#5b3a5e"/><stop offset="0.78" stop-color="#d9825b"/></linearGradient></defs>
        <rect width="${W}" height="${H}" fill="url(#dusk)"/>${stars}
        <path d="M0,1640 C350,1560 700,1620 1000,1580 C1250,1550 1400,1590 ${W},1600 L${W},${H} L0,${H} Z" fill="#2b2e3f"/>
        <path d="M0,1900 C400,1820 900,1880 ${W},1800 L${W},1860 C900,1940 400,1880 0,1960 Z" fill="#4a4257"/>` },
      { name: 'Moon', svg: `<circle cx="1160" cy="420" r="95" fill="#f6eac8"/><circle cx="1130" cy="400" r="14" fill="#e8dab4"/><circle cx="1190" cy="450" r="9" fill="#e8dab4"/>` },
      { name: 'Trees', svg: `<g fill="#23263a"><path d="M120,1650 L210,1250 L300,1650 Z"/><path d="M1250,1610 L1330,1300 L1410,1610 Z"/>
        <rect x="200" y="1640" width="20" height="60"/><rect x="1320" y="1600" width="20" height="60"/></g>` },
      fox(foxes[0]),
      fox(foxes[1]),
      { name: 'Lantern glow', blendMode: 'screen', opacity: 0.85,
        svg: `<defs><radialGradient id="glow"><stop offset="0" stop-color="#ffcf6b" stop-opacity="0.9"/><stop offset="1" stop-color="#ff9a3c" stop-opacity="0"/></radialGradient></defs>
          ${glowAt.map(([x, y, r]) => `<circle cx="${x}" cy="${y}" r="${r}" fill="url(#glow)"/>`).join('')}` },
      { name: 'Falling leaves', children: leaves.map(([name, x, y, a, s, c, oak]) => leaf(name, x, y, a, s, c, oak)) },
      { name: 'Title', svg: `<path d="${textPath('Lantern Walk', 700, 183, W / 2, 300)}" fill="#f6eac8"/>`,
        text: { content: 'Lantern Walk', fontName: 'Source Sans 3', sizePt: 44, x: W / 2, y: 300 } },
    ],
  };
}
