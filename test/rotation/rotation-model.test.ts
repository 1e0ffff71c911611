import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import geodesic from 'geographiclib-geodesic';
import { InputError } from '../../src/problems';
import {
  BEYOND_MODEL, ROTATION_STATUS, RotationLookupError,
  createQuaternion, createRotationModel, multiplyQuaternionsInto, poleFromQuaternion, poleTableFromRecords,
  rotateVectorInto, type BeyondModel, type RotationModel,
} from '../../src/rotation';
// Independent reference: rotation matrices by Rodrigues' formula, and the SO(3) geodesic that
// slerp must follow (see ./rodrigues for sources). Nothing there uses quaternions.
import { angleBetweenDeg, apply, axisAngleOfMatrix, geodesicBetween, matMul, poleMatrix, transpose, unit } from './rodrigues';
import { TEST_POLE_HEADER } from './pole-rows';

const DEG = 180 / Math.PI;

function modelOf(lines: readonly string[], beyond: BeyondModel = BEYOND_MODEL.reject): RotationModel {
  const records = lines.map((l, i) => ({ line: i + 2, fields: l.split(',') }));
  return createRotationModel(poleTableFromRecords(TEST_POLE_HEADER, records, 'poles.csv'), { beyond });
}

function problemsOf(lines: readonly string[]): string[] {
  try {
    modelOf(lines);
  } catch (error) {
    if (error instanceof InputError) return error.message.split('\n');
    throw error;
  }
  throw new Error('expected a InputError');
}

function moved(model: RotationModel, plate: number, age: number, lat: number, lon: number): [number, number, number] {
  const v = rotateVectorInto(model.rotationAt(plate, age), unit(lat, lon), new Float64Array(3));
  return [v[0], v[1], v[2]];
}

/** The inverse rotation: a unit quaternion's conjugate (Kuipers 1999, Quaternions and Rotation Sequences, ch. 5). */
function inverse(q: ArrayLike<number>): Float64Array {
  return Float64Array.of(q[0], -q[1], -q[2], -q[3]);
}

function expectSamePlace(actual: ArrayLike<number>, expected: ArrayLike<number>, toleranceDeg = 1e-10): void {
  expect(angleBetweenDeg(actual, expected)).toBeLessThan(toleranceDeg);
}

/** Row text with full double precision, from a rotation matrix given as a quaternion. */
function row(plate: number, age: number, q: ArrayLike<number>, parent: number): string {
  const p = poleFromQuaternion(q);
  return `${plate},${age},${p.lat},${p.lon},${p.angle},${parent}`;
}

const degrees = (min: number, max: number) => fc.integer({ min: min * 1e4, max: max * 1e4 }).map((i) => i / 1e4);
const pole = fc.record({ lat: degrees(-90, 90), lon: degrees(-180, 180), angle: degrees(-179, 179) });

describe('rotating a point about a pole', () => {
  // Worked by hand with the spherical cosine and sine rules (Todhunter 1886, Spherical
  // Trigonometry, §§ 41, 44), not taken from a book's example: pole E at 45°N 0°E, point P at
  // 0°N 0°E, so EP = 45° and P lies due south of E. Turning P by 90° anticlockwise seen from above
  // E moves its azimuth from E from 180° to 90°, so in the triangle N E P′ (N the north pole):
  // cos NP′ = cos 45° cos 45° + sin 45° sin 45° cos 90° = 1/2, NP′ = 60°, latitude 30°N;
  // cos λ = (cos EP′ − cos NE cos NP′)/(sin NE sin NP′) = (√2/2 − √2/4)/(√2/2 · √3/2) = 1/√3,
  // λ = 54.7356…°E (east, as the azimuth from E is 90°).
  it('moves 0°N 0°E to 30°N 54.7356°E under 90° about 45°N 0°E, as worked by hand', () => {
    const model = modelOf(['1,10,45,0,90,0']);
    const v = moved(model, 1, 10, 0, 0);
    expect(Math.asin(v[2]) * DEG).toBeCloseTo(30, 12);
    expect(Math.atan2(v[1], v[0]) * DEG).toBeCloseTo(Math.acos(1 / Math.sqrt(3)) * DEG, 12);
    expect(Math.acos(1 / Math.sqrt(3)) * DEG).toBeCloseTo(54.7356, 4);
  });

  // GeographicLib (Karney 2013) on a sphere (flattening 0): a rotation about E keeps the arc from
  // E and turns the azimuth at E by the angle, clockwise for a negative (right-hand) angle.
  it('keeps the arc from the pole and turns the azimuth there by the angle, per GeographicLib', () => {
    const sphere = new geodesic.Geodesic.Geodesic(1, 0);
    fc.assert(fc.property(pole, degrees(-80, 80), degrees(-180, 180), (e, lat, lon) => {
      const model = modelOf([`1,10,${e.lat},${e.lon},${e.angle},0`]);
      const v = moved(model, 1, 10, lat, lon);
      const before = sphere.Inverse(e.lat, e.lon, lat, lon), after = sphere.Inverse(e.lat, e.lon, Math.asin(v[2]) * DEG, Math.atan2(v[1], v[0]) * DEG);
      expect(after.a12!).toBeCloseTo(before.a12!, 8);
      fc.pre(before.a12! > 1e-3 && before.a12! < 180 - 1e-3 && Math.abs(e.lat) < 89.99);
      const turn = ((before.azi1! - after.azi1! - e.angle) % 360 + 540) % 360 - 180;
      expect(Math.abs(turn)).toBeLessThan(1e-6);
    }), { numRuns: 300 });
  });

  it('leaves a point on the pole of rotation where it is, at every age', () => {
    const model = modelOf(['1,10,-20,130,15,0', '1,40,-20,130,75,0']);
    for (const age of [0, 3, 10, 27.5, 40]) expectSamePlace(moved(model, 1, age, -20, 130), unit(-20, 130));
  });

  it('turns a half-turn about 0°N 0°E: north pole to south pole, 90°E to 90°W, 0°E kept', () => {
    const model = modelOf(['1,10,0,0,180,0']);
    expectSamePlace(moved(model, 1, 10, 90, 0), [0, 0, -1]);
    expectSamePlace(moved(model, 1, 10, 0, 90), unit(0, -90));
    expectSamePlace(moved(model, 1, 10, 0, 0), unit(0, 0));
  });
});

describe('interpolation and composition, against an independent rotation-matrix computation', () => {
  it('interpolates between tabulated ages along the rotation geodesic (slerp), as Rodrigues matrices do', () => {
    fc.assert(fc.property(pole, pole, degrees(0, 1), degrees(-90, 90), degrees(-180, 180), (a, b, f, lat, lon) => {
      const ma = poleMatrix(a.lat, a.lon, a.angle), mb = poleMatrix(b.lat, b.lon, b.angle);
      // Away from rotations half a turn apart, where the shortest way between them is not unique.
      fc.pre(axisAngleOfMatrix(matMul(mb, transpose(ma))).angle < Math.PI - 1e-3);
      const model = modelOf([`1,20,${a.lat},${a.lon},${a.angle},0`, `1,50,${b.lat},${b.lon},${b.angle},0`]);
      const age = 20 + 30 * f;
      expectSamePlace(moved(model, 1, age, lat, lon), apply(geodesicBetween(ma, mb, f), unit(lat, lon)), 1e-8);
    }), { numRuns: 300 });
  });

  it('composes a chain as total(parent) ∘ relative(plate), each link interpolated at the age', () => {
    fc.assert(fc.property(pole, pole, pole, pole, degrees(0, 30), (a1, a2, b1, b2, age) => {
      const model = modelOf([
        `1,0,90,0,0,0`, `1,30,${a1.lat},${a1.lon},${a1.angle},0`, `1,60,${a2.lat},${a2.lon},${a2.angle},0`,
        `2,30,${b1.lat},${b1.lon},${b1.angle},1`, `2,60,${b2.lat},${b2.lon},${b2.angle},1`,
      ]);
      const at = 30 + age;
      const f = (at - 30) / 30;
      const parent = geodesicBetween(poleMatrix(a1.lat, a1.lon, a1.angle), poleMatrix(a2.lat, a2.lon, a2.angle), f);
      const own = geodesicBetween(poleMatrix(b1.lat, b1.lon, b1.angle), poleMatrix(b2.lat, b2.lon, b2.angle), f);
      expectSamePlace(moved(model, 2, at, 12, 34), apply(matMul(parent, own), unit(12, 34)), 1e-7);
      expect(model.chainAt(2, at)).toEqual([2, 1, 0]);
    }), { numRuns: 200 });
  });

  it('puts a plate without a 0 Ma row at its present-day position at 0 Ma and turns it about the first pole from there', () => {
    const model = modelOf(['1,20,10,20,40,0']);
    expect(Array.from(model.rotationAt(1, 0))).toEqual([1, 0, 0, 0]);
    // Slerp from the identity keeps the pole and scales the angle (Shoemake 1985).
    expectSamePlace(moved(model, 1, 5, -30, 60), apply(poleMatrix(10, 20, 10), unit(-30, 60)));
  });

  it('undoes a total rotation with its inverse, and gives a plate relative to another as inverse(total B) ∘ total A', () => {
    const model = modelOf(['1,40,60,-20,25,0', '2,40,-10,80,-35,0']);
    const a = model.rotationAt(1, 25);
    const back = rotateVectorInto(inverse(a), moved(model, 1, 25, 5, 6), new Float64Array(3));
    expectSamePlace(back, unit(5, 6));
    // A model with plate 1 tabulated relative to plate 2 instead gives the same total at the tabulated age.
    const relative = multiplyQuaternionsInto(inverse(model.rotationAt(2, 40)), model.rotationAt(1, 40), createQuaternion());
    const chained = modelOf([row(1, 40, relative, 2), '2,40,-10,80,-35,0']);
    expectSamePlace(moved(chained, 1, 40, 5, 6), moved(model, 1, 40, 5, 6), 1e-9);
    expect(chained.chainAt(1, 40)).toEqual([1, 2, 0]);
  });

  it('keeps a docked plate on its parent at every age (interpolating links, not totals)', () => {
    // Plate 2 fixed to plate 1 (same relative rotation at both ages): its total must follow plate 1 exactly.
    const model = modelOf(['1,0,90,0,0,0', '1,100,30,40,60,0', '2,0,10,10,20,1', '2,100,10,10,20,1']);
    const docked = poleMatrix(10, 10, 20);
    for (const age of [0, 12.5, 50, 99]) {
      const parent = moved(model, 1, age, ...toLatLon(apply(docked, unit(3, 4))));
      expectSamePlace(moved(model, 2, age, 3, 4), parent, 1e-9);
    }
  });
});

function toLatLon(v: ArrayLike<number>): [number, number] {
  return [Math.atan2(v[2], Math.hypot(v[0], v[1])) * DEG, Math.atan2(v[1], v[0]) * DEG];
}

describe('a plate that changes relative_to through time', () => {
  // Plate 3 moves with plate 1 until 100 Ma and relative to the fixed plate before; the change is
  // tabulated twice at 100 Ma, once against each parent, describing the same position.
  const base = ['1,0,90,0,0,0', '1,200,20,30,40,0', '3,0,90,0,0,1', '3,100,-5,60,12,1'];
  const crossing = () => [...base, row(3, 100, modelOf(base).rotationAt(3, 100), 0), '3,200,40,-50,70,0'];

  it('takes the parent of the tabulated interval holding the age, the younger one on the change itself', () => {
    const model = modelOf(crossing());
    expect(model.chainAt(3, 50)).toEqual([3, 1, 0]);
    expect(model.chainAt(3, 100)).toEqual([3, 1, 0]);
    expect(model.chainAt(3, 100.5)).toEqual([3, 0]);
  });

  it('moves continuously across the change when both rows there describe the same position', () => {
    const model = modelOf(crossing());
    expectSamePlace(moved(model, 3, 100 - 1e-9, 7, 8), moved(model, 3, 100 + 1e-9, 7, 8), 1e-6);
  });

  it('interpolates after the change relative to the new parent only', () => {
    const lines = crossing();
    const model = modelOf(lines);
    const [, , lat, lon, angle] = lines[4].split(',').map(Number);
    const expected = geodesicBetween(poleMatrix(lat, lon, angle), poleMatrix(40, -50, 70), 0.25);
    expectSamePlace(moved(model, 3, 125, 7, 8), apply(expected, unit(7, 8)), 1e-9);
  });

  it('refuses a change of parent that is not tabulated twice, naming plate, ages, parents and lines', () => {
    expect(problemsOf(['1,100,20,30,40,0', '3,90,-5,60,12,1', '3,100,1,2,3,0'])).toEqual([
      'poles.csv line 4, relative_to "0": expected the same relative_to as plate 3 has at 90 Ma, 1 (line 3), or the age where it changes tabulated relative to both plates: otherwise nothing can be interpolated between 90 and 100 Ma',
    ]);
  });

  it('refuses two parents on both sides of an interval', () => {
    expect(problemsOf(['1,100,20,30,40,0', '3,50,1,2,3,1', '3,50,1,2,4,0', '3,60,1,2,3,1', '3,60,1,2,4,0'])).toEqual([
      'poles.csv line 5, relative_to "1 and 0": expected a single parent for plate 3 between 50 and 60 Ma, but both parents are given at 60 Ma and at 50 Ma',
    ]);
  });

  it('refuses two parents at a plate’s youngest age when it has no 0 Ma row', () => {
    expect(problemsOf(['1,100,20,30,40,0', '3,50,1,2,3,1', '3,50,1,2,4,0'])).toEqual([
      'poles.csv line 3, relative_to "1 and 0": expected a single parent for plate 3 between 0 and 50 Ma, but at 0 Ma every plate is at its present-day position and both parents are given at 50 Ma',
    ]);
  });
});

describe('the plate tree', () => {
  it('takes as fixed the one plate that appears only as relative_to, at the identity at every age', () => {
    const model = modelOf(['101,10,1,2,3,900', '201,10,4,5,6,101']);
    expect(model.fixedPlate).toBe(900);
    expect(model.hasPlate(900)).toBe(true);
    expect(model.reachMa(900)).toBe(Infinity);
    expect(Array.from(model.rotationAt(900, 1234))).toEqual([1, 0, 0, 0]);
    expect(model.plateIds()).toEqual([101, 201]);
  });

  it('refuses more than one plate that appears only as relative_to, naming them and their lines', () => {
    expect(problemsOf(['101,10,1,2,3,0', '201,10,4,5,6,901', '301,10,4,5,6,901'])).toEqual([
      'poles.csv, relative_to "0, 901": expected one fixed reference plate, but 0 (line 2) and 901 (lines 3, 4) all appear only as relative_to; give poles for all but one of them',
    ]);
  });

  it('names the plates of a cycle and the ages at which they form it', () => {
    expect(problemsOf(['1,50,1,2,3,2', '2,50,1,2,3,1', '3,50,1,2,3,0'])).toEqual([
      'poles.csv, relative_to "1 → 2 → 1": expected a chain of relative_to ending at the fixed plate, but from 0 to 50 Ma each of these plates moves relative to the next, in a cycle',
    ]);
  });

  it('finds a cycle that exists only for part of the time', () => {
    // 1 and 2 both move relative to 0 until 100 Ma, then relative to each other.
    expect(problemsOf([
      '1,100,1,2,3,0', '1,100,1,2,3,2', '1,200,1,2,4,2', '2,100,5,6,7,0', '2,100,5,6,7,1', '2,200,5,6,8,1',
    ])).toEqual([
      'poles.csv, relative_to "1 → 2 → 1": expected a chain of relative_to ending at the fixed plate, but from 100 to 200 Ma each of these plates moves relative to the next, in a cycle',
    ]);
  });

  it('notes rows it cannot use and 0 Ma rows that are not the identity', () => {
    const model = modelOf(['1,0,10,10,1,0', '1,50,1,2,3,0', '1,50,1,2,3,7', '7,10,0,0,1,0']);
    expect(model.notes).toEqual([
      'line 2: the 0 Ma rotation of plate 1 is not the identity, so its present-day positions move at 0 Ma',
      'line 4 (plate 1 at 50 Ma relative to 7) is not used: no neighbouring age of the plate is relative to 7',
    ]);
  });
});

describe('plates and ages the model does not reach', () => {
  const lines = ['401,0,90,0,0,0', '401,150,-20,30,25,0', '501,0,90,0,0,401', '501,300,10,-77,15,401'];

  it('reaches back as far as every link of the chain is tabulated', () => {
    const model = modelOf(lines);
    expect(model.reachMa(401)).toBe(150);
    expect(model.reachMa(501)).toBe(150);
    expect(model.reachMa(999)).toBeUndefined();
  });

  it('refuses an older age by default, naming plate, ages, chain and the plate whose poles end', () => {
    const model = modelOf(lines);
    expect(model.tryRotationAt(501, 150.5, createQuaternion())).toBe(ROTATION_STATUS.beyondModel);
    expect(() => model.rotationAt(501, 200)).toThrow(new RotationLookupError(ROTATION_STATUS.beyondModel, 501, 200,
      'Plate 501 can be reconstructed back to 150 Ma with poles.csv (chain 501 → 401 → 0; the poles of plate 401 end there); 200 Ma is older.'));
    expect(() => model.rotationAt(401, 151)).toThrow('Plate 401 can be reconstructed back to 150 Ma with poles.csv (chain 401 → 0; its own poles end there); 151 Ma is older.');
  });

  it('clamps an older age to the oldest reached when asked to, and says it did', () => {
    const model = modelOf(lines, BEYOND_MODEL.clamp);
    const q = createQuaternion();
    expect(model.tryRotationAt(501, 200, q)).toBe(ROTATION_STATUS.clamped);
    expect(Array.from(q)).toEqual(Array.from(model.rotationAt(501, 150)));
    expect(model.tryRotationAt(501, 150, q)).toBe(ROTATION_STATUS.ok);
  });

  it('counts reach without gaps, even where an older stretch of the chain is tabulated again', () => {
    // Plate 2 moves relative to 1 (tabulated to 50 Ma) until 100 Ma, then relative to 0 to 200 Ma.
    const model = modelOf(['1,50,1,2,3,0', '2,100,1,2,3,1', '2,100,4,5,6,0', '2,200,4,5,7,0']);
    expect(model.reachMa(2)).toBe(50);
    expect(() => model.rotationAt(2, 150)).toThrow('Plate 2 can be reconstructed back to 50 Ma with poles.csv (chain 2 → 1 → 0; the poles of plate 1 end there); 150 Ma is older.');
  });

  it('refuses a plate that is not in the model, listing those that are', () => {
    const model = modelOf(lines);
    expect(model.tryRotationAt(999, 10, createQuaternion())).toBe(ROTATION_STATUS.plateNotInModel);
    expect(() => model.rotationAt(999, 10)).toThrow('Plate 999 is not in the rotation model poles.csv (plates with poles: 401, 501; fixed plate 0).');
  });

  it('refuses a negative or missing age', () => {
    const model = modelOf(lines);
    expect(model.tryRotationAt(401, -1, createQuaternion())).toBe(ROTATION_STATUS.noAge);
    expect(model.tryRotationAt(401, Number.NaN, createQuaternion())).toBe(ROTATION_STATUS.noAge);
    expect(() => model.rotationAt(401, -1)).toThrow(RangeError);
  });
});

describe('the rotation cache', () => {
  it('gives the same rotation for a pair asked again, and after more pairs than it keeps', () => {
    const model = modelOf(['1,100,20,30,40,0', '2,100,-20,-30,50,1']);
    const first = Array.from(model.rotationAt(2, 33.3));
    expect(Array.from(model.rotationAt(2, 33.3))).toEqual(first);
    for (let k = 0; k < 70_000; k++) model.rotationAt(2, k / 1000);
    expect(Array.from(model.rotationAt(2, 33.3))).toEqual(first);
    const fresh = modelOf(['1,100,20,30,40,0', '2,100,-20,-30,50,1']);
    expect(Array.from(fresh.rotationAt(2, 69.999))).toEqual(Array.from(model.rotationAt(2, 69.999)));
  });

  it('is bypassed by tryUncachedRotationAt, which gives the same status and bit-identical rotation', () => {
    // Plate 2 changes parent at 60 Ma; plate 3 rides on 2; plates reach 100 Ma, older ages clamp.
    const table = ['1,100,20,30,40,0', '2,60,-20,-30,50,1', '2,60,10,15,20,0', '2,100,5,25,30,0', '3,80,45,-60,12,2'];
    const model = modelOf(table, BEYOND_MODEL.clamp);
    const cached = createQuaternion(), uncached = createQuaternion();
    fc.assert(fc.property(fc.constantFrom(1, 2, 3, 0, 9), fc.oneof(degrees(-1, 130), fc.constantFrom(0, 60, 80, 100)), (plate, age) => {
      const status = model.tryRotationAt(plate, age, cached);
      expect(model.tryUncachedRotationAt(plate, age, uncached)).toBe(status);
      if (status <= ROTATION_STATUS.clamped) expect(Array.from(uncached)).toEqual(Array.from(cached));
    }));
  });

  it('hands out copies, so a caller writing into the result cannot spoil the cache', () => {
    const model = modelOf(['1,100,20,30,40,0']);
    const q = model.rotationAt(1, 50);
    const copy = Array.from(q);
    q.fill(0);
    expect(Array.from(model.rotationAt(1, 50))).toEqual(copy);
  });
});
