import { textPath, type DemoDocument, type DemoGroup, type DemoLayer } from './demo-layers';

// "Puffin Picnic", Saltmarsh Studio's spring birthday card: 5 x 7 in at 300 PPI.
const W = 1500;
const H = 2100;
const INK = '#1d1f2a';

type PuffinStyle = { name: string; x: number; y: number; mirrored: boolean; jumper: string; rib: string; pattern: string };

function placed(style: PuffinStyle, body: string): string {
  const transform = style.mirrored ? `translate(${style.x + 400},${style.y}) scale(-1,1)` : `translate(${style.x},${style.y})`;
  return `<g transform="${transform}">${body}</g>`;
}

function puffin(style: PuffinStyle): DemoGroup {
  const layer = (name: string, body: string, extra: Partial<DemoLayer> = {}): DemoLayer => ({ name, svg: placed(style, body), ...extra });
  const zigzag = Array.from({ length: 24 }, (_, i) => `${30 + i * 15},${i % 2 ? 392 : 410}`).join(' ');
  const dots = Array.from({ length: 11 }, (_, i) => `<circle cx="${55 + i * 30}" cy="452" r="6"/>`).join('');
  const ribs = Array.from({ length: 26 }, (_, i) => `<line x1="${48 + i * 12}" y1="508" x2="${48 + i * 12}" y2="560"/>`).join('');
  const collar = Array.from({ length: 22 }, (_, i) => `<line x1="${70 + i * 12}" y1="285" x2="${70 + i * 12}" y2="318"/>`).join('');
  return {
    name: style.name,
    children: [
      layer('Feet', `<g fill="#f08a24"><rect x="140" y="560" width="22" height="60" rx="9"/><rect x="240" y="560" width="22" height="60" rx="9"/>
        <path d="M100,640 Q150,600 200,640 Z"/><path d="M200,640 Q250,600 300,640 Z"/></g>`),
      layer('Body', `<ellipse cx="200" cy="410" rx="150" ry="195" fill="${INK}"/>`),
      layer('Belly', `<ellipse cx="215" cy="450" rx="100" ry="140" fill="#fbf7ef"/>`),
      layer('Jumper', `<g fill="${style.jumper}"><path d="M75,330 C95,280 305,280 325,330 L345,520 C345,565 55,565 55,520 Z"/>
        <path d="M72,335 C15,390 18,480 62,528 L98,505 C82,452 88,392 104,348 Z"/>
        <path d="M328,335 C385,390 382,480 338,528 L302,505 C318,452 312,392 296,348 Z"/></g>`),
      layer('Knit pattern', `<polyline points="${zigzag}" fill="none" stroke="${style.pattern}" stroke-width="9" stroke-linejoin="round"/>
        <g fill="${style.pattern}">${dots}</g><g stroke="${style.rib}" stroke-width="5">${ribs}${collar}</g>`, { clipping: true }),
      layer('Head', `<circle cx="205" cy="200" r="118" fill="${INK}"/>`),
      layer('Face', `<path d="M212,112 C292,104 326,178 310,250 C296,302 214,308 172,270 C136,236 146,122 212,112 Z" fill="#fbf7ef"/>`),
      layer('Eye', `<path d="M232,206 Q246,214 262,206" stroke="#5a5e6b" stroke-width="4" fill="none" stroke-linecap="round"/><circle cx="246" cy="190" r="16" fill="#e2553f"/>
        <circle cx="246" cy="190" r="10" fill="${INK}"/><circle cx="250" cy="186" r="4" fill="#ffffff"/>`),
      layer('Beak', `<path d="M302,170 C312,180 314,252 302,260 C294,240 294,190 302,170 Z" fill="#8a8f9a"/>
        <path d="M306,172 C342,180 386,206 398,228 C386,246 342,258 306,258 C320,230 320,200 306,172 Z" fill="#f07d28"/>
        <path d="M334,184 C348,205 348,238 334,252" stroke="#f6c744" stroke-width="8" fill="none" stroke-linecap="round"/>`),
      layer('Cheek', `<ellipse cx="262" cy="240" rx="22" ry="13" fill="#f4a3a8"/>`, { opacity: 0.7 }),
    ],
  };
}

function waves(top: number, amplitude: number, step: number): string {
  let d = `M0,${top}`;
  for (let x = 0; x < W; x += step * 2) d += ` q${step / 2},${-amplitude} ${step},0 q${step / 2},${amplitude} ${step},0`;
  return d;
}

function background(): DemoLayer {
  const speckles = Array.from({ length: 60 }, (_, i) => {
    const x = (i * 197) % W;
    const y = 1480 + ((i * 83) % 600);
    return `<circle cx="${x}" cy="${y}" r="${3 + (i % 3)}" fill="#e2c48c"/>`;
  }).join('');
  return {
    name: 'Background',
    svg: `<defs><linearGradient id="sky" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#bfe3ec"/>
      <stop offset="0.62" stop-color="#f6f1e2"/></linearGradient></defs>
      <rect width="${W}" height="${H}" fill="url(#sky)"/>
      <circle cx="250" cy="600" r="105" fill="#ffd98a"/>
      <path d="M0,1420 C300,1380 700,1445 1000,1402 C1200,1374 1400,1394 ${W},1410 L${W},${H} L0,${H} Z" fill="#f1d9a7"/>${speckles}`,
  };
}

function cloud(cx: number, cy: number, s: number): string {
  return `<g fill="#ffffff" transform="translate(${cx},${cy}) scale(${s})"><ellipse cx="0" cy="0" rx="120" ry="50"/>
    <circle cx="-50" cy="-25" r="55"/><circle cx="35" cy="-45" r="70"/><circle cx="95" cy="-10" r="45"/></g>`;
}

function kite(): DemoGroup {
  const bows = [[1150, 900], [1205, 1000], [1140, 1090]].map(([x, y], i) =>
    `<path d="M${x - 28},${y - 16} L${x},${y} L${x - 28},${y + 16} Z M${x + 28},${y - 16} L${x},${y} L${x + 28},${y + 16} Z" fill="${['#e76f51', '#2a9d8f', '#e9c46a'][i]}"/>`).join('');
  return {
    name: 'Kite',
    children: [
      { name: 'Kite string', svg: `<path d="M1180,640 C1000,900 760,1200 562,1478" stroke="#3d405b" stroke-width="3" fill="none"/>` },
      { name: 'Kite tail', svg: `<path d="M1180,820 C1110,880 1230,960 1175,1030 C1130,1090 1190,1130 1150,1180" stroke="#3d405b" stroke-width="4" fill="none"/>${bows}` },
      { name: 'Kite', svg: `<path d="M1180,430 L1310,600 L1180,600 Z" fill="#e76f51"/><path d="M1310,600 L1180,820 L1180,600 Z" fill="#f4a261"/>
        <path d="M1180,820 L1050,600 L1180,600 Z" fill="#2a9d8f"/><path d="M1050,600 L1180,430 L1180,600 Z" fill="#e9c46a"/>
        <path d="M1180,430 L1180,820 M1050,600 L1310,600" stroke="#3d405b" stroke-width="6"/>` },
    ],
  };
}

function basket(): DemoGroup {
  const weave = [1740, 1780, 1820, 1860, 1900].map((y) => `<line x1="590" y1="${y}" x2="915" y2="${y}"/>`).join('')
    + Array.from({ length: 11 }, (_, i) => `<line x1="${610 + i * 28}" y1="1705" x2="${620 + i * 26}" y2="1945"/>`).join('');
  const checks = Array.from({ length: 12 }, (_, i) => `<rect x="${585 + i * 28}" y="1688" width="14" height="60" fill="#d6453d" opacity="0.85"/>`).join('')
    + [1695, 1723].map((y) => `<rect x="585" y="${y}" width="330" height="12" fill="#d6453d" opacity="0.6"/>`).join('');
  return {
    name: 'Picnic basket',
    children: [
      { name: 'Handle', svg: `<path d="M615,1705 C625,1530 875,1530 885,1705" stroke="#a86f36" stroke-width="20" fill="none"/>` },
      { name: 'Apples', svg: `<circle cx="670" cy="1680" r="34" fill="#c9463d"/><circle cx="735" cy="1672" r="30" fill="#8cc152"/>
        <path d="M670,1648 l6,-18 M735,1643 l4,-16" stroke="#5b3a29" stroke-width="6"/>` },
      { name: 'Basket', svg: `<path d="M580,1700 L920,1700 L890,1940 Q750,1962 610,1940 Z" fill="#c98b4a"/>
        <g stroke="#a86f36" stroke-width="6" opacity="0.8">${weave}</g>` },
      { name: 'Gingham cloth', svg: `<defs><clipPath id="cloth"><path d="M585,1688 L915,1688 L905,1738 Q880,1772 852,1744 Q822,1776 792,1744 Q762,1776 732,1744 Q702,1776 672,1744 Q642,1776 614,1744 Q590,1768 590,1738 Z"/></clipPath></defs>
        <g clip-path="url(#cloth)"><rect x="580" y="1680" width="340" height="110" fill="#fbf7ef"/>${checks}</g>` },
    ],
  };
}

function sandwich(name: string, x: number, filling: string): DemoLayer {
  return {
    name,
    svg: `<path d="M${x},1995 L${x + 70},1860 L${x + 140},1995 Z" fill="#d9a35b"/><path d="M${x + 14},1985 L${x + 70},1878 L${x + 126},1985 Z" fill="#f6dea4"/>
      <path d="M${x + 6},1995 L${x + 134},1995" stroke="${filling}" stroke-width="14" stroke-linecap="round"/>`,
  };
}

export function puffinPicnic(): DemoDocument {
  return {
    width: W,
    height: H,
    ppi: 300,
    children: [
      background(),
      { name: 'Clouds', svg: `${cloud(1120, 900, 1)}${cloud(420, 980, 0.75)}`, opacity: 0.9 },
      { name: 'Wave band', blendMode: 'multiply', opacity: 0.8,
        svg: `<path d="${waves(1210, 34, 75)} L${W},1440 L0,1440 Z" fill="#5fa8c8"/><path d="${waves(1300, 24, 60)} L${W},1380 L0,1380 Z" fill="#8cc7dc"/>` },
      kite(),
      puffin({ name: 'Puffin Red Jumper', x: 200, y: 1140, mirrored: false, jumper: '#d6453d', rib: '#a8302b', pattern: '#fbf7ef' }),
      basket(),
      { name: 'Sandwiches', children: [
        { name: 'Plate', svg: `<ellipse cx="1170" cy="2000" rx="165" ry="42" fill="#ffffff" stroke="#7fb3d5" stroke-width="8"/>` },
        sandwich('Cucumber sandwich', 1030, '#8cc152'),
        sandwich('Tomato sandwich', 1165, '#e5533d'),
      ] },
      puffin({ name: 'Puffin Teal Jumper', x: 920, y: 1170, mirrored: true, jumper: '#2a9d8f', rib: '#1f7268', pattern: '#f6c744' }),
      { name: 'Title', svg: `<path d="${textPath('Puffin Picnic', 700, 183, W / 2, 330)}" fill="#23395b"/>`,
        text: { content: 'Puffin Picnic', fontName: 'Source Sans 3', sizePt: 44, x: W / 2, y: 330 } },
      { name: 'Sketch', hidden: true, opacity: 0.6,
        svg: `<g fill="none" stroke="#6b6b6b" stroke-width="3" stroke-dasharray="14 8"><ellipse cx="400" cy="1550" rx="160" ry="200"/>
          <circle cx="405" cy="1340" r="120"/><ellipse cx="1120" cy="1580" rx="160" ry="200"/><path d="M580,1700 L920,1700 L890,1940 L610,1940 Z"/></g>` },
    ],
  };
}
