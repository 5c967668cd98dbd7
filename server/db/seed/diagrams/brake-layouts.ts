// Fictional demo data: invented makers, models and numbers.
// Exploded-diagram layouts for the demo brake assemblies. Each layout maps a callout number to the shapes
// drawn for it and its bubble; the brake data (catalog-brakes.ts) uses the same callout numbers, and
// renderDiagram draws only the callouts an assembly's lines use, so diagram and parts list cannot drift.
import {
  backingPlate,
  band,
  bleeder,
  bolt,
  boot,
  bracketL,
  bushing,
  cable,
  circle,
  clevis,
  clevisPin,
  cotterPin,
  crushWasher,
  cup,
  cylinderBody,
  drum,
  dustCap,
  fillerCap,
  fitting,
  gasketRing,
  hexagon,
  hose,
  hoseClip,
  kitOutline,
  lever,
  line,
  lineClamp,
  masterCylinderBody,
  nut,
  pClip,
  pedal,
  pedalPad,
  piston,
  rect,
  rod,
  shaft,
  shoe,
  snapRing,
  spring,
  stopSwitch,
  tHandle,
  tee,
  text,
  tube,
  washerFace,
  washerSide,
  type DiagramItem,
  type DiagramLayout,
  type Pt,
} from './svg-kit';

const faint = { stroke: '#9aa5b1', width: 1 } as const;
const item = (shapes: string, anchors: Pt[], bubble: Pt): DiagramItem => ({ shapes, anchors, bubble });
const label = (x: number, y: number, s: string) => text(x, y, s, { size: 11, fill: '#7b8794' });

export type BrakeDiagramKind = 'pedals' | 'master_cylinder' | 'front_lines' | 'rear_lines' | 'wheel_brake' | 'wheel_cylinder' | 'parking';

export function pedalsLayout(title: string): DiagramLayout {
  return {
    title,
    background: line(250, 170, 560, 170, { dash: '6 4', ...faint }) + line(440, 300, 740, 300, { dash: '6 4', ...faint }) + label(648, 318, 'to master cylinder'),
    items: {
      '1': item(pedal(330, 170, 230, 470), [[268, 350]], [200, 360]),
      '2': item(pedalPad(230, 485), [[200, 485]], [140, 530]),
      '3': item(bracketL(110, 110, 150, 130), [[112, 150]], [70, 120]),
      '4': item(shaft(392, 170, 90), [[440, 162]], [440, 110]),
      '5': item(bushing(290, 170, 20, 22) + bushing(370, 170, 20, 22), [[290, 159], [370, 159]], [330, 100]),
      '6': item(spring(160, 260, 136, 8, 8) + line(160, 260, 160, 240, { width: 1.8 }), [[220, 252]], [205, 305]),
      '7': item(rod(470, 300, 640), [[560, 296]], [560, 250]),
      '8': item(clevis(422, 300), [[426, 286]], [410, 240]),
      '9': item(clevisPin(380, 368, 40), [[400, 363]], [400, 410]),
      '10': item(cotterPin(455, 368, 40), [[475, 365]], [480, 410]),
      '11': item(hexagon(490, 300, 10), [[490, 290]], [490, 250]),
      '12': item(bolt(560, 478, 44, 'right'), [[585, 474]], [585, 430]),
      '13': item(washerSide(648, 478, 22, true), [[648, 467]], [648, 430]),
      '14': item(nut(690, 478, 11), [[690, 467]], [705, 430]),
      '15': item(washerSide(505, 170, 24), [[505, 158]], [510, 110]),
      '16': item(snapRing(535, 170, 12), [[538, 158]], [565, 118]),
    },
  };
}

export function masterCylinderLayout(title: string): DiagramLayout {
  return {
    title,
    background: line(30, 300, 760, 300, { dash: '10 5', ...faint }) + line(190, 140, 190, 219, { dash: '4 4', ...faint }) + line(80, 272, 80, 289, { dash: '4 4', ...faint }) + label(170, 530, 'attaching hardware'),
    items: {
      '1': item(masterCylinderBody(260, 300, 220, 70), [[345, 330]], [372, 392]),
      '2': item(fillerCap(190, 150, 48), [[214, 150]], [262, 132]),
      '3': item(gasketRing(190, 185, 48), [[214, 185]], [262, 190]),
      '4': item(boot(630, 300, 90, 22), [[675, 280]], [690, 230]),
      '5': item(kitOutline(382, 255, 344, 100, 'repair kit'), [[470, 355]], [470, 400]),
      '6': item(cup(510, 300, 20, 'left'), [[510, 278]], [510, 232]),
      '7': item(piston(555, 300, 40, 20) + cup(580, 300, 18), [[555, 280]], [565, 232]),
      '8': item(spring(418, 300, 70, 14, 6), [[453, 287]], [453, 232]),
      '9': item(cup(398, 300, 12), [[398, 288]], [398, 232]),
      '10': item(stopSwitch(80, 262), [[92, 225]], [60, 170]),
      '11': item(fitting(80, 300), [[80, 311]], [60, 360]),
      '12': item(washerSide(122, 300, 24), [[122, 288]], [122, 245]),
      '13': item(bolt(190, 480, 50, 'right'), [[222, 476]], [222, 440]),
      '14': item(washerSide(290, 480, 22, true), [[290, 469]], [290, 440]),
      '15': item(snapRing(612, 300, 18), [[614, 282]], [618, 232]),
      '16': item(nut(340, 480, 11), [[340, 469]], [350, 440]),
    },
  };
}

export function frontLinesLayout(title: string): DiagramLayout {
  const bg =
    rect(230, 90, 20, 490, { fill: '#eef1f4', stroke: '#9aa5b1', width: 1 }) +
    rect(550, 90, 20, 490, { fill: '#eef1f4', stroke: '#9aa5b1', width: 1 }) +
    rect(230, 150, 340, 20, { fill: '#eef1f4', stroke: '#9aa5b1', width: 1 }) +
    rect(90, 250, 620, 16, { fill: 'none', dash: '6 4', ...faint }) +
    rect(50, 200, 40, 120, { fill: 'none', dash: '6 4', ...faint }) +
    rect(710, 200, 40, 120, { fill: 'none', dash: '6 4', ...faint }) +
    rect(256, 500, 48, 40, { fill: 'none', dash: '5 4', ...faint }) +
    line(292, 360, 292, 500, { dash: '5 3', ...faint }) +
    label(310, 560, 'master cylinder') + label(300, 80, 'front of vehicle') + label(60, 345, 'left wheel') + label(700, 345, 'right wheel');
  return {
    title,
    background: bg,
    items: {
      '1': item(tube([[278, 500], [278, 360], [400, 360], [400, 210]]), [[368, 363]], [345, 420]),
      '2': item(tee(400, 190), [[410, 176]], [440, 122]),
      '3': item(tube([[374, 190], [300, 190], [300, 215], [224, 215]]), [[300, 200]], [310, 120]),
      '4': item(tube([[426, 190], [500, 190], [500, 215], [576, 215]]), [[500, 200]], [520, 120]),
      '5': item(hose([206, 215], [118, 242]) + hose([594, 215], [682, 242]), [[162, 229]], [160, 170]),
      '6': item(hoseClip(206, 184) + hoseClip(594, 184), [[196, 178]], [190, 112]),
      '7': item(lineClamp(340, 360) + lineClamp(400, 300) + lineClamp(400, 250) + lineClamp(278, 390), [[340, 353], [393, 300]], [340, 290]),
      '8': item(lineClamp(285, 470, true) + lineClamp(285, 420, true), [[268, 470], [268, 420]], [200, 445]),
      '9': item(crushWasher(112, 268, 9) + crushWasher(688, 268, 9), [[119, 274]], [145, 305]),
      '10': item(bolt(600, 470, 40, 'right'), [[622, 466]], [622, 428]),
      '11': item(washerSide(680, 470, 22, true), [[680, 459]], [680, 428]),
      '12': item(hexagon(224, 215, 6) + hexagon(576, 215, 6) + hexagon(374, 190, 6) + hexagon(426, 190, 6) + hexagon(400, 210, 6) + hexagon(278, 500, 6), [[576, 215]], [540, 270]),
      '13': item(bolt(620, 530, 24, 'right'), [[630, 522]], [580, 540]),
    },
  };
}

/** Rear lines; `tandem` draws the 6x6 layout (two rear axles fed from a frame tee between them). */
export function rearLinesLayout(title: string, tandem: boolean): DiagramLayout {
  const rails =
    rect(230, 70, 20, 500, { fill: '#eef1f4', stroke: '#9aa5b1', width: 1 }) + rect(550, 70, 20, 500, { fill: '#eef1f4', stroke: '#9aa5b1', width: 1 }) + label(270, 84, 'from front tee');
  if (!tandem) {
    return {
      title,
      background:
        rails +
        rect(230, 290, 340, 18, { fill: '#eef1f4', stroke: '#9aa5b1', width: 1 }) +
        rect(90, 440, 620, 16, { fill: 'none', dash: '6 4', ...faint }) +
        rect(50, 390, 40, 120, { fill: 'none', dash: '6 4', ...faint }) +
        rect(710, 390, 40, 120, { fill: 'none', dash: '6 4', ...faint }) +
        label(470, 472, 'rear axle housing'),
      items: {
        '1': item(tube([[262, 90], [262, 330], [392, 330]]), [[262, 160]], [190, 160]),
        '2': item(hose([400, 336], [400, 392]), [[410, 364]], [470, 364]),
        '3': item(tee(400, 425), [[400, 446]], [400, 485]),
        '4': item(tube([[374, 425], [120, 425], [112, 440]]) + tube([[426, 425], [680, 425], [688, 440]]), [[160, 425]], [160, 370]),
        '5': item(bracketL(412, 316, 44, 36), [[446, 321]], [500, 300]),
        '6': item(hoseClip(360, 340), [[352, 334]], [330, 380]),
        '7': item(lineClamp(262, 130) + lineClamp(262, 200) + lineClamp(262, 270) + lineClamp(330, 330), [[269, 200], [330, 323]], [320, 230]),
        '8': item(lineClamp(300, 425) + lineClamp(200, 425) + lineClamp(500, 425) + lineClamp(600, 425), [[300, 432], [200, 432]], [250, 485]),
        '9': item(crushWasher(400, 402, 8), [[391, 402]], [340, 420]),
        '10': item(bolt(600, 520, 40, 'right'), [[622, 516]], [622, 478]),
        '11': item(washerSide(680, 520, 22, true), [[680, 509]], [680, 478]),
        '12': item(hexagon(392, 330, 6) + hexagon(374, 425, 6) + hexagon(426, 425, 6) + hexagon(120, 425, 6) + hexagon(680, 425, 6), [[426, 425]], [500, 380]),
      },
    };
  }
  return {
    title,
    background:
      rails +
      rect(90, 250, 620, 16, { fill: 'none', dash: '6 4', ...faint }) +
      rect(90, 500, 620, 16, { fill: 'none', dash: '6 4', ...faint }) +
      rect(230, 376, 340, 18, { fill: '#eef1f4', stroke: '#9aa5b1', width: 1 }) +
      label(600, 246, 'forward-rear axle') + label(600, 534, 'rear-rear axle'),
    items: {
      '1': item(tube([[262, 90], [262, 385], [374, 385]]), [[262, 160]], [190, 160]),
      '2': item(hose([400, 366], [400, 262]) + hose([400, 406], [400, 460]), [[410, 320], [410, 432]], [470, 345]),
      '3': item(tee(400, 238) + tee(400, 486), [[420, 231]], [470, 200]),
      '4': item(
        tube([[374, 238], [120, 238]]) + tube([[426, 238], [680, 238]]) + tube([[374, 486], [120, 486]]) + tube([[426, 486], [680, 486]]),
        [[160, 238], [160, 486]],
        [110, 360],
      ),
      '5': item(bracketL(440, 400, 44, 30), [[470, 405]], [515, 440]),
      '6': item(hoseClip(436, 292) + hoseClip(436, 440), [[446, 286]], [485, 285]),
      '7': item(lineClamp(262, 130) + lineClamp(262, 210) + lineClamp(262, 290) + lineClamp(320, 385), [[255, 290], [255, 210]], [190, 290]),
      '8': item(lineClamp(300, 238) + lineClamp(500, 238) + lineClamp(300, 486) + lineClamp(500, 486), [[300, 493]], [270, 545]),
      '9': item(crushWasher(372, 292, 7) + crushWasher(372, 450, 7), [[366, 454]], [325, 470]),
      '10': item(bolt(610, 410, 40, 'right'), [[632, 406]], [632, 440]),
      '11': item(washerSide(690, 410, 22, true), [[690, 421]], [690, 440]),
      '12': item(hexagon(374, 238, 6) + hexagon(426, 238, 6) + hexagon(374, 486, 6) + hexagon(426, 486, 6) + hexagon(374, 385, 6), [[426, 492]], [470, 535]),
      '13': item(tee(400, 385), [[386, 377]], [330, 340]),
    },
  };
}

export function wheelCylinderLayout(title: string): DiagramLayout {
  return {
    title,
    background: line(120, 300, 700, 300, { dash: '10 5', ...faint }) + line(400, 140, 400, 258, { dash: '4 4', ...faint }) + label(130, 530, 'attaching hardware'),
    items: {
      '1': item(cylinderBody(400, 300, 130, 60), [[445, 330]], [500, 372]),
      '2': item(boot(150, 300, 70, 24) + boot(580, 300, 70, 24), [[185, 279]], [185, 222]),
      '3': item(piston(262, 300, 30, 18) + piston(538, 300, 30, 18), [[262, 282]], [252, 222]),
      '4': item(cup(305, 300, 18, 'left') + cup(495, 300, 18, 'right'), [[305, 279]], [315, 222]),
      '5': item(spring(340, 400, 110, 12, 7), [[360, 390]], [300, 420]),
      '6': item(bleeder(400, 215), [[408, 212]], [470, 215]),
      '7': item(dustCap(400, 160), [[408, 158]], [470, 150]),
      '8': item(kitOutline(560, 410, 200, 120, 'repair kit') + cup(600, 460, 14) + boot(630, 460, 50, 16) + spring(700, 460, 44, 8, 4), [[560, 440]], [530, 400]),
      '9': item(bolt(140, 480, 40, 'right'), [[165, 476]], [165, 440]),
      '10': item(washerSide(230, 480, 22, true), [[230, 469]], [236, 440]),
    },
  };
}

export function wheelBrakeLayout(title: string): DiagramLayout {
  const c: Pt = [360, 330];
  return {
    title,
    background:
      rect(315, 172, 90, 26, { fill: 'none', dash: '5 4', ...faint }) + label(315, 166, 'wheel cylinder') + label(580, 250, 'attaching hardware'),
    items: {
      '1': item(backingPlate(c[0], c[1], 200), [[533, 230]], [590, 180]),
      '2': item(shoe(c[0], c[1], 150, 'left') + shoe(c[0], c[1], 150, 'right'), [[218, 300]], [140, 200]),
      '3': item('', [[206, 380]], [110, 430]),
      '4': item(spring(285, 214, 150, 6, 9), [[400, 208]], [470, 100]),
      '5': item(circle(335, 470, 9, { fill: '#c9d2da' }) + circle(385, 470, 9, { fill: '#c9d2da' }), [[385, 479]], [420, 565]),
      '6': item(circle(275, 260, 12, { fill: '#c9d2da' }) + hexagon(279, 258, 5) + circle(445, 260, 12, { fill: '#c9d2da' }) + hexagon(441, 258, 5), [[287, 262], [433, 262]], [360, 240]),
      '7': item(clevisPin(600, 300, 40) + circle(270, 380, 4) + circle(450, 380, 4), [[620, 295]], [620, 270]),
      '8': item(spring(600, 340, 44, 7, 5), [[622, 333]], [690, 320]),
      '9': item(washerFace(700, 370, 9) + washerFace(725, 370, 9), [[700, 361]], [720, 335]),
      '10': item(nut(600, 410, 11), [[600, 399]], [580, 380]),
      '11': item(washerSide(640, 410, 22, true), [[640, 399]], [650, 380]),
      '12': item(bolt(600, 460, 40, 'right'), [[624, 456]], [700, 460]),
      '13': item(spring(300, 440, 120, 5, 8), [[330, 434]], [260, 540]),
    },
  };
}

export function parkingBrakeLayout(title: string): DiagramLayout {
  return {
    title,
    background: label(60, 96, 'in cab') + label(560, 440, 'on transfer case output'),
    items: {
      '1': item(tHandle(120, 140), [[160, 140]], [210, 110]),
      '2': item(cable([[120, 210], [120, 300], [300, 380], [470, 380], [540, 340]]), [[210, 340]], [230, 300]),
      '3': item(pClip(120, 260) + pClip(300, 380), [[111, 260]], [60, 260]),
      '4': item(bracketL(470, 392, 60, 40), [[505, 397]], [520, 455]),
      '5': item(drum(620, 330, 80), [[680, 370]], [740, 450]),
      '6': item(band(620, 330, 92), [[706, 361]], [755, 330]),
      '7': item(bolt(575, 215, 60, 'right'), [[610, 211]], [600, 150]),
      '8': item(spring(590, 190, 60, 6, 5), [[635, 184]], [680, 160]),
      '9': item(lever(540, 340, 598, 236), [[569, 288]], [520, 255]),
      '10': item(clevisPin(150, 488, 40), [[170, 483]], [180, 445]),
      '11': item(cotterPin(225, 488, 40), [[245, 485]], [250, 445]),
      '12': item(nut(305, 488, 11), [[305, 477]], [310, 445]),
      '13': item(bolt(345, 488, 40, 'right'), [[370, 484]], [375, 445]),
      '14': item(washerSide(430, 488, 22, true), [[430, 477]], [435, 445]),
    },
  };
}

export function brakeLayout(kind: BrakeDiagramKind, title: string, tandem: boolean): DiagramLayout {
  switch (kind) {
    case 'pedals':
      return pedalsLayout(title);
    case 'master_cylinder':
      return masterCylinderLayout(title);
    case 'front_lines':
      return frontLinesLayout(title);
    case 'rear_lines':
      return rearLinesLayout(title, tandem);
    case 'wheel_brake':
      return wheelBrakeLayout(title);
    case 'wheel_cylinder':
      return wheelCylinderLayout(title);
    case 'parking':
      return parkingBrakeLayout(title);
  }
}
