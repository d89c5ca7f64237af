package sheet

import (
	"math"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"
)

// mmPerPt is the length of the PDF point, mm: 1 pt = 1/72 in (the PDF
// reference's unit of user space, from memory) and 1 in = 25.4 mm (the 1959
// international yard and pound agreement).
const mmPerPt = 25.4 / 72

// transform maps metres of a view's world (plan: cell X, Y; elevation: jet
// x, height; clearance view: jet x, distance from the axis) to page
// millimetres. It is the one place where metres become millimetres. The
// vertical scale may differ from the horizontal one (a stated vertical
// exaggeration in a side view); in the plan they are equal.
type transform struct {
	k      float64 // mm of page per m of world, horizontally: 1000/scale
	ky     float64 // mm of page per m of world, vertically
	ox, oy float64 // page position of world (0, 0), mm
}

// newTransform returns the transform at scale 1:scale that puts world point
// (wx, wy) at page point p.
func newTransform(scale int, wx, wy float64, p Pt) transform {
	return newTransform2(scale, scale, wx, wy, p)
}

// newTransform2 returns the transform at 1:sx horizontally and 1:sy
// vertically that puts world point (wx, wy) at page point p.
func newTransform2(sx, sy int, wx, wy float64, p Pt) transform {
	k, ky := 1000/float64(sx), 1000/float64(sy)
	return transform{k: k, ky: ky, ox: p.X - wx*k, oy: p.Y + wy*ky}
}

// pt returns the page point of world point (x, y), world y up.
func (t transform) pt(x, y float64) Pt { return Pt{t.ox + x*t.k, t.oy - y*t.ky} }

// world returns the world point of page point p.
func (t transform) world(p Pt) (float64, float64) { return (p.X - t.ox) / t.k, (t.oy - p.Y) / t.ky }

// mm returns a world length (m) on the page, mm, horizontally.
func (t transform) mm(m float64) float64 { return m * t.k }

// add, sub, scale and unit are small vector helpers on page points.
func add(a, b Pt) Pt                  { return Pt{a.X + b.X, a.Y + b.Y} }
func sub(a, b Pt) Pt                  { return Pt{a.X - b.X, a.Y - b.Y} }
func mul(a Pt, s float64) Pt          { return Pt{a.X * s, a.Y * s} }
func length(a Pt) float64             { return math.Hypot(a.X, a.Y) }
func dist(a, b Pt) float64            { return math.Hypot(a.X-b.X, a.Y-b.Y) }
func rot(a Pt, ang float64) Pt        { s, c := math.Sincos(ang); return Pt{a.X*c - a.Y*s, a.X*s + a.Y*c} }
func perp(a Pt) Pt                    { return Pt{-a.Y, a.X} }
func lerp(a, b Pt, t float64) Pt      { return Pt{a.X + t*(b.X-a.X), a.Y + t*(b.Y-a.Y)} }
func rectAround(c Pt, r float64) Rect { return Rect{c.X - r, c.Y - r, 2 * r, 2 * r} }

// unit returns a scaled to length 1, or fallback when a is (nearly) zero.
func unit(a Pt, fallback Pt) Pt {
	l := length(a)
	if l < 1e-9 {
		return fallback
	}
	return Pt{a.X / l, a.Y / l}
}

// boundOf returns the smallest rectangle holding pts.
func boundOf(pts []Pt) Rect {
	if len(pts) == 0 {
		return Rect{}
	}
	x0, y0, x1, y1 := pts[0].X, pts[0].Y, pts[0].X, pts[0].Y
	for _, p := range pts[1:] {
		x0, y0 = math.Min(x0, p.X), math.Min(y0, p.Y)
		x1, y1 = math.Max(x1, p.X), math.Max(y1, p.Y)
	}
	return Rect{x0, y0, x1 - x0, y1 - y0}
}

// segHitsRect reports whether the segment ab meets the rectangle r shrunk
// by gap (mm) on every side (Liang–Barsky clipping).
func segHitsRect(a, b Pt, r Rect, gap float64) bool { return segHitsEdges(a, b, bndOf(r), gap) }

// segHitsEdges is segHitsRect for the box with edges e. Growing the box
// never turns a hit into a miss, rounding included.
func segHitsEdges(a, b Pt, e bnd, gap float64) bool {
	x0, y0, x1, y1 := e.x0+gap, e.y0+gap, e.x1-gap, e.y1-gap
	if x0 >= x1 || y0 >= y1 {
		return false
	}
	t0, t1 := 0.0, 1.0
	dx, dy := b.X-a.X, b.Y-a.Y
	for _, c := range [4][2]float64{{-dx, a.X - x0}, {dx, x1 - a.X}, {-dy, a.Y - y0}, {dy, y1 - a.Y}} {
		p, q := c[0], c[1]
		if p == 0 {
			if q < 0 {
				return false
			}
			continue
		}
		t := q / p
		if p < 0 {
			t0 = math.Max(t0, t)
		} else {
			t1 = math.Min(t1, t)
		}
		if t0 > t1 {
			return false
		}
	}
	return true
}

// rectEdgePoint returns the point of r's boundary nearest to p, for leader
// lines.
func rectEdgePoint(r Rect, p Pt) Pt {
	q := Pt{math.Max(r.X, math.Min(p.X, r.Right())), math.Max(r.Y, math.Min(p.Y, r.Bottom()))}
	return q
}

// offsetRing returns ring r (world metres, closed or open, either
// orientation) moved outward by d (m), with mitred corners whose miter is
// capped at 4d. It is for drawing the treatment behind a boundary.
func offsetRing(r orb.Ring, d float64) orb.Ring {
	pts := []orb.Point(r)
	if len(pts) > 1 && pts[0] == pts[len(pts)-1] {
		pts = pts[:len(pts)-1]
	}
	n := len(pts)
	if n < 3 {
		return nil
	}
	// signed area: positive for counter-clockwise
	area := 0.0
	for i := range n {
		a, b := pts[i], pts[(i+1)%n]
		area += a[0]*b[1] - b[0]*a[1]
	}
	sgn := 1.0
	if area < 0 {
		sgn = -1
	}
	// outward normal of edge i (a→b) of a counter-clockwise ring is (dy, −dx)
	normal := func(i int) (float64, float64) {
		a, b := pts[i], pts[(i+1)%n]
		dx, dy := b[0]-a[0], b[1]-a[1]
		l := math.Hypot(dx, dy)
		if l == 0 {
			return 0, 0
		}
		return sgn * dy / l, -sgn * dx / l
	}
	out := make(orb.Ring, 0, n+1)
	for i := range n {
		nx0, ny0 := normal((i + n - 1) % n)
		nx1, ny1 := normal(i)
		mx, my := nx0+nx1, ny0+ny1
		ml := math.Hypot(mx, my)
		p := pts[i]
		if ml < 1e-9 {
			out = append(out, orb.Point{p[0] + d*nx1, p[1] + d*ny1})
			continue
		}
		mx, my = mx/ml, my/ml
		cos := mx*nx1 + my*ny1 // cosine of half the turn
		f := d / math.Max(cos, 0.25)
		out = append(out, orb.Point{p[0] + f*mx, p[1] + f*my})
	}
	return append(out, out[0])
}

// slerp returns points on the circular arc about c from a to b (3-D, m):
// the direction turns in the plane of c, a and b and the distance from c
// changes linearly. The first point is a, the last b; about one point per
// maxStep radians of turn. When a and b are (nearly) opposite the plane is
// undefined and the straight segment is returned.
func slerp(c, a, b r3.Vec, maxStep float64) []r3.Vec {
	u, v := r3.Sub(a, c), r3.Sub(b, c)
	lu, lv := r3.Norm(u), r3.Norm(v)
	if lu == 0 || lv == 0 {
		return []r3.Vec{a, b}
	}
	cos := r3.Dot(u, v) / (lu * lv)
	cos = math.Max(-1, math.Min(1, cos))
	w := math.Acos(cos)
	if w < 1e-9 || math.Pi-w < 1e-3 {
		return []r3.Vec{a, b}
	}
	// at most 4096 steps, whatever maxStep is (a tiny or zero step must
	// not run away)
	n := int(math.Min(math.Ceil(w/maxStep), 4096))
	out := make([]r3.Vec, 0, n+1)
	uh, vh := r3.Scale(1/lu, u), r3.Scale(1/lv, v)
	sw := math.Sin(w)
	for i := 0; i <= n; i++ {
		t := float64(i) / float64(n)
		switch i {
		case 0:
			out = append(out, a)
			continue
		case n:
			out = append(out, b)
			continue
		}
		dir := r3.Add(r3.Scale(math.Sin((1-t)*w)/sw, uh), r3.Scale(math.Sin(t*w)/sw, vh))
		out = append(out, r3.Add(c, r3.Scale(lu+t*(lv-lu), dir)))
	}
	return out
}

// circlePts returns n+1 points of the circle of centre c and radius r
// (page mm), closed.
func circlePts(c Pt, r float64, n int) []Pt {
	out := make([]Pt, n+1)
	for i := range n {
		s, co := math.Sincos(2 * math.Pi * float64(i) / float64(n))
		out[i] = Pt{c.X + r*co, c.Y + r*s}
	}
	out[n] = out[0]
	return out
}

// finite reports whether every v is neither NaN nor infinite.
func finite(v ...float64) bool {
	for _, x := range v {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			return false
		}
	}
	return true
}
