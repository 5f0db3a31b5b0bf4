// A pinhole camera for the site photos: scenes are laid out in feet (x to the right, y up, z away
// from the photographer) and projected, so decks, bars and joints recede the way they do on site.
export type Vec3 = readonly [number, number, number];
export type Point = readonly [number, number];

export type CameraSetup = { eye: Vec3; yawDeg?: number; pitchDeg: number; rollDeg?: number; focalPx: number; width: number; height: number };

const near = 0.25;

export type Camera = {
  width: number;
  height: number;
  // Camera-space coordinates: x right, y up, z depth along the view.
  view(p: Vec3): Vec3;
  project(p: Vec3): Point | null;
  // Screen size in pixels of a world length at the point's depth.
  pixels(p: Vec3, lengthFt: number): number;
  // The part of a world segment inside the clipping frustum, as world points; null if none.
  segment(a: Vec3, b: Vec3): [Vec3, Vec3] | null;
  // SVG points attribute of a world polygon, clipped at the near plane; null if nothing is left.
  polygon(points: Vec3[]): string | null;
};

export function camera(setup: CameraSetup): Camera {
  const yaw = ((setup.yawDeg ?? 0) * Math.PI) / 180;
  const pitch = (setup.pitchDeg * Math.PI) / 180;
  const roll = ((setup.rollDeg ?? 0) * Math.PI) / 180;
  const [ex, ey, ez] = setup.eye;
  const { focalPx: f, width, height } = setup;

  const view = ([x, y, z]: Vec3): Vec3 => {
    const dx = x - ex;
    const dy = y - ey;
    const dz = z - ez;
    const x1 = dx * Math.cos(yaw) - dz * Math.sin(yaw);
    const z1 = dx * Math.sin(yaw) + dz * Math.cos(yaw);
    const y2 = dy * Math.cos(pitch) + z1 * Math.sin(pitch);
    const z2 = z1 * Math.cos(pitch) - dy * Math.sin(pitch);
    return [x1 * Math.cos(roll) + y2 * Math.sin(roll), y2 * Math.cos(roll) - x1 * Math.sin(roll), z2];
  };
  const toScreen = ([x, y, z]: Vec3): Point => [width / 2 + (f * x) / z, height / 2 - (f * y) / z];

  // Clip in camera space against the near plane and a frustum half again wider than the picture,
  // so a large ground polygon never reaches the rasteriser as millions of pixels.
  const kx = (1.5 * width) / 2 / f;
  const ky = (1.5 * height) / 2 / f;
  const planes: ((v: Vec3) => number)[] = [(v) => v[2] - near, (v) => v[0] + kx * v[2], (v) => kx * v[2] - v[0], (v) => v[1] + ky * v[2], (v) => ky * v[2] - v[1]];
  const clipBy = (points: Vec3[], side: (v: Vec3) => number): Vec3[] => {
    const out: Vec3[] = [];
    points.forEach((a, i) => {
      const b = points[(i + 1) % points.length]!;
      const da = side(a);
      const db = side(b);
      if (da >= 0) out.push(a);
      if (da >= 0 !== db >= 0) {
        const t = da / (da - db);
        out.push([a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t, a[2] + (b[2] - a[2]) * t]);
      }
    });
    return out;
  };
  const clip = (points: Vec3[]): Vec3[] => planes.reduce((pts, plane) => (pts.length < 3 ? pts : clipBy(pts, plane)), points);

  return {
    width,
    height,
    view,
    project: (p) => {
      const v = view(p);
      return v[2] < near ? null : toScreen(v);
    },
    pixels: (p, lengthFt) => (f * lengthFt) / Math.max(near, view(p)[2]),
    segment: (a, b) => {
      const va = view(a);
      const vb = view(b);
      let t0 = 0;
      let t1 = 1;
      for (const plane of planes) {
        const da = plane(va);
        const db = plane(vb);
        if (da < 0 && db < 0) return null;
        if (da < 0) t0 = Math.max(t0, da / (da - db));
        if (db < 0) t1 = Math.min(t1, da / (da - db));
      }
      if (t0 >= t1) return null;
      const at = (t: number): Vec3 => [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t, a[2] + (b[2] - a[2]) * t];
      return [at(t0), at(t1)];
    },
    polygon: (points) => {
      const clipped = clip(points.map(view));
      if (clipped.length < 3) return null;
      return clipped.map((v) => toScreen([v[0], v[1], Math.max(near, v[2])]).map((n) => n.toFixed(1)).join(',')).join(' ');
    },
  };
}
