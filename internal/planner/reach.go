package planner

import (
	"fmt"
	"math"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
)

// surface is a kind of surface that a zone can reach.
type surface int

const (
	surfaceBoundary surface = iota + 1 // the walls, or an outdoor site's limit
	surfaceFloor                       // the floor, or the ground of a pad
	surfaceCeiling
	surfaceObstacle // one of the cell's obstacles
)

// contact is where a conservative zone first reaches a surface.
type contact struct {
	surface surface
	// obstacle is the index in Cell.Obstacles for surfaceObstacle, else -1.
	obstacle int
	// x is the jet-frame axial distance, m, at which the zone first reaches
	// the surface.
	x float64
	// at is where to mark the contact in plan, cell frame, m: the zone's
	// edge outside the boundary, else the axis at x.
	at orb.Point
}

// Thresholds of the search for obstacles in a zone.
const (
	// reachStepFraction is the axial step of the obstacle search as a
	// fraction of the zone's local radius: every point of the zone is
	// within a searched ball (derived, see zoneReaches).
	reachStepFraction = 0.5
	// reachMinSteps bounds the step of the obstacle search from below, as
	// the zone's length over this number, so the search stays linear.
	reachMinSteps = 500
)

// captureX returns the jet-frame distance, m, of the collector inlet when
// point p's plume is captured (not blocked), or +Inf: beyond it the
// collector takes the exhaust and no surface is reached.
func captureX(req *Request, p *PointResult) float64 {
	if req.Cell.Collector != nil && p.Capture != Blocked {
		return req.Exit.ToJet(req.Cell.Collector.Inlet).X
	}
	return math.Inf(1)
}

// zoneReaches returns where the zone env first reaches the boundary, the
// floor, the ceiling and each obstacle of req's cell upstream of capture
// (a jet-frame distance, m; +Inf without a collector), in that order, the
// obstacles by increasing x and then by their order in the layout.
// obstacles indexes req.Cell.Solids().
//
// The boundary, floor and ceiling are tested on the outline (the boundary
// on the horizontal meridian, either side), and the contact is placed where
// the outline first crosses them: by bisection along the outline segment
// for the boundary, linearly between vertices for the floor and ceiling. An
// obstacle may be reached when it comes within a ball about an axis point
// that holds the zone's slice there: balls of radius R + h (R the largest
// zone radius within a step h either side) every h along the axis cover the
// zone. From the first such ball on, firstSlabContact finds the first slab
// of the zone that meets the obstacle, which is the reported contact; an
// obstacle near the zone but outside it is not reported. Within one zone
// radius of the exit plane the ball is shrunk to its distance from the exit
// plane, so that the rig or wall the nozzle is mounted on is not reported
// as struck.
func zoneReaches(req *Request, obstacles *geometry.Index, env *jet.Envelope, capture float64) []contact {
	cell := &req.Cell
	f := req.Exit
	wall, floor, ceiling := math.Inf(1), math.Inf(1), math.Inf(1)
	var wallAt orb.Point
	outside := func(x, r, az float64) (orb.Point, bool) {
		c := f.ToCell(geometry.JetPoint{X: x, R: r, Azimuth: az})
		pt := orb.Point{c.X, c.Y}
		return pt, !cell.Contains(pt)
	}
	for i, q := range env.Points {
		x, r := q[0], q[1]
		if x >= capture {
			break
		}
		for _, az := range []float64{0, math.Pi} {
			if !cell.Bounded() || x >= wall {
				continue
			}
			if pt, out := outside(x, r, az); out {
				bx, bat := x, pt
				if i > 0 {
					// the outline left the boundary between the vertex
					// before and this one: bisect for the crossing
					bx, bat = crossing(env, env.Points[i-1], q, func(x, r float64) (orb.Point, bool) { return outside(x, r, az) })
				}
				if bx < wall {
					wall, wallAt = bx, bat
				}
			}
		}
		if f.Exit.Z-r < 0 && x < floor {
			floor = levelCrossing(env.Points, i, f.Exit.Z)
		}
		if f.Exit.Z+r > cell.Ceiling && x < ceiling {
			ceiling = levelCrossing(env.Points, i, cell.Ceiling-f.Exit.Z)
		}
	}
	var out []contact
	for _, s := range []struct {
		kind surface
		x    float64
	}{{surfaceBoundary, wall}, {surfaceFloor, floor}, {surfaceCeiling, ceiling}} {
		if !math.IsInf(s.x, 1) {
			a := f.ToCell(geometry.JetPoint{X: s.x})
			c := contact{surface: s.kind, obstacle: -1, x: s.x, at: orb.Point{a.X, a.Y}}
			if s.kind == surfaceBoundary {
				c.at = wallAt
			}
			out = append(out, c)
		}
	}
	return append(out, obstacleReaches(f, obstacles, env, capture)...)
}

// crossBisections is the number of halvings of an outline segment when
// looking for where it leaves the boundary: 2⁻⁴⁰ of the segment.
const crossBisections = 40

// crossing returns the first point of the outline segment from a (inside)
// to b (outside), both (x, r) in m, that out reports outside the boundary,
// found by bisection, with its plan position (cell frame, m). The radius
// along the segment is the zone's exact radius where the segment runs
// downstream, the straight segment elsewhere (up the exit plane).
func crossing(env *jet.Envelope, a, b [2]float64, out func(x, r float64) (orb.Point, bool)) (float64, orb.Point) {
	at := func(t float64) (float64, float64) {
		x := a[0] + t*(b[0]-a[0])
		r := a[1] + t*(b[1]-a[1])
		if b[0] > a[0] && x > 0 && x < env.Length {
			r = math.Max(r, env.Radius(x))
		}
		return x, r
	}
	lo, hi := 0.0, 1.0
	x, r := at(hi)
	pt, _ := out(x, r)
	for range crossBisections {
		mid := (lo + hi) / 2
		mx, mr := at(mid)
		if p, o := out(mx, mr); o {
			hi, x, pt = mid, mx, p
		} else {
			lo = mid
		}
	}
	return x, pt
}

// levelCrossing returns the axial distance, m, at which the outline pts
// first reaches radius level, given that vertex i is the first at or beyond
// it: linear between vertex i−1 and i.
func levelCrossing(pts [][2]float64, i int, level float64) float64 {
	if i == 0 {
		return pts[0][0]
	}
	a, b := pts[i-1], pts[i]
	if b[1] <= a[1] || a[1] >= level {
		return a[0]
	}
	return a[0] + (b[0]-a[0])*(level-a[1])/(b[1]-a[1])
}

// obstacleReaches returns the obstacles of the index that the zone env
// reaches upstream of capture, by increasing x, as zoneReaches describes.
func obstacleReaches(f geometry.JetFrame, obstacles *geometry.Index, env *jet.Envelope, capture float64) []contact {
	if obstacles == nil || obstacles.Len() == 0 || env.Length == 0 {
		return nil
	}
	end := math.Min(env.Length, capture)
	minStep := env.Length / reachMinSteps
	step := func(x float64) float64 { return math.Max(reachStepFraction*env.Radius(x), minStep) }
	seen := map[int]bool{}
	var out []contact
	var near []int
	for x := 0.0; x < end; {
		h := step(x)
		next := math.Min(x+h, end)
		// the ball at the middle of [x, next] holds the zone's slices there
		mid := (x + next) / 2
		r := math.Max(env.Radius(x), math.Max(env.Radius(mid), env.Radius(next))) + (next - x)
		r = math.Min(r, mid)
		c := f.ToCell(geometry.JetPoint{X: mid})
		near = obstacles.AppendNear(near[:0], orb.Point{c.X, c.Y}, r)
		for _, i := range near {
			if seen[i] || obstacles.Solid(i).Distance(c) > r {
				continue
			}
			seen[i] = true
			// the ball only says the zone may meet the obstacle from x on:
			// find the first slab of the zone that does
			s := obstacles.Solid(i)
			cx, ok := firstSlabContact(f, s, env, math.Max(x, firstContactStep), end)
			if !ok {
				continue // near the zone, not in it
			}
			a := f.ToCell(geometry.JetPoint{X: cx})
			out = append(out, contact{surface: surfaceObstacle, obstacle: i, x: cx, at: orb.Point{a.X, a.Y}})
		}
		x = next
	}
	return out
}

// firstContactStep is the length, m, of the shortest slab of the zone that
// firstSlabContact tests: the contact it reports is at most this far
// upstream of the true one.
const firstContactStep = 1e-4

// firstSlabContact returns the smallest axial distance x in [a, b] (m, jet
// frame) at which the zone env meets the prism s, to within
// firstContactStep upstream, and false when it does not meet it there.
//
// The jet axis is horizontal, so the zone between x1 and x2 lies in the
// horizontal cylinder about the axis of radius Rmax, the zone's largest
// radius there. A vertical prism meets that cylinder exactly when its
// height range comes within Rmax of the axis height (dz) and its footprint
// meets the plan rectangle x1..x2 by ±√(Rmax² − dz²) about the axis
// (derived). Halving the slabs, first the upstream half, finds the first
// slab that meets the prism; slabs that do not meet it hold no contact.
func firstSlabContact(f geometry.JetFrame, s geometry.Solid, env *jet.Envelope, a, b float64) (float64, bool) {
	var dz float64
	switch z := f.Exit.Z; {
	case z < s.ZMin:
		dz = s.ZMin - z
	case z > s.ZMax:
		dz = z - s.ZMax
	}
	meets := func(x1, x2 float64) bool {
		r := slabRadius(env, x1, x2)
		if dz > r {
			return false
		}
		w := math.Sqrt(r*r - dz*dz)
		var c [4]orb.Point
		for k, q := range []geometry.JetPoint{{X: x1, R: w}, {X: x2, R: w}, {X: x2, R: w, Azimuth: math.Pi}, {X: x1, R: w, Azimuth: math.Pi}} {
			v := f.ToCell(q)
			c[k] = orb.Point{v.X, v.Y}
		}
		for k := range c {
			if s.Footprint.SegmentDistance(c[k], c[(k+1)%4]) == 0 {
				return true
			}
		}
		// the footprint wholly inside the rectangle
		var p orb.Point
		if s.Footprint.IsCircle() {
			p = s.Footprint.Center
		} else {
			p = s.Footprint.Ring[0]
		}
		return geometry.Polygon(orb.Ring{c[0], c[1], c[2], c[3], c[0]}).Contains(p)
	}
	var first func(x1, x2 float64) (float64, bool)
	first = func(x1, x2 float64) (float64, bool) {
		if !meets(x1, x2) {
			return 0, false
		}
		if x2-x1 <= firstContactStep {
			return x1, true
		}
		m := (x1 + x2) / 2
		if x, ok := first(x1, m); ok {
			return x, true
		}
		return first(m, x2)
	}
	if b <= a {
		return 0, false
	}
	return first(a, b)
}

// slabRadius returns an upper bound of the radius of the zone env between
// x1 and x2, m: the largest of the exact radius at both ends, the middle
// and the outline's vertices between, plus the outline's tolerance.
func slabRadius(env *jet.Envelope, x1, x2 float64) float64 {
	r := math.Max(env.Radius(x1), math.Max(env.Radius(x2), env.Radius((x1+x2)/2)))
	for _, q := range env.Points {
		if q[0] > x1 && q[0] < x2 {
			r = math.Max(r, math.Max(q[1], env.Radius(q[0])))
		}
	}
	return r + env.Tolerance
}

// splash is the region along a struck obstacle's face where the exhaust
// spreads as a wall jet that the free-jet model does not describe.
type splash struct {
	point    string  // operating point
	zone     string  // "velocity zone" or "hot zone"
	obstacle int     // index in Cell.Obstacles
	x        float64 // jet-frame distance of the contact, m
	at       r3.Vec  // the axis point of the contact, cell frame, m
	reach    float64 // how far from at the spreading flow is taken to reach, m
	radius   float64 // the zone's radius at the contact, m
}

// splashDepthRatio is the thickness of a wall jet as a fraction of the
// distance it has run along the surface: about three half-widths of the
// plane wall jet, whose half-width grows at dy½/dx ≈ 0.073 (Launder & Rodi
// 1981 review, from memory; noise-and-exposure reference sheet §8),
// rounded up. SUGGESTION.
const splashDepthRatio = 0.22

// findSplashes returns, for every operating point and both conservative zones,
// the splash regions of the obstacles the zone reaches. The flow turned
// along a face decays at least as fast as the free jet would have (a radial
// wall jet's velocity falls as 1/r, Launder & Rodi 1981, from memory), so
// the zone's length left beyond the contact, plus its radius there, bounds
// how far the spreading flow stays above the limit (derived). Its depth at
// a distance s from the contact is the zone's radius at the contact plus
// splashDepthRatio·s.
func (ck *checker) findSplashes() []splash {
	if len(ck.req.Cell.Obstacles) == 0 {
		return nil
	}
	var out []splash
	for k := range ck.points {
		p := &ck.points[k]
		capture := captureX(ck.req, p)
		for _, z := range []struct {
			name string
			env  *jet.Envelope
		}{{"velocity zone", p.Velocity()}, {"hot zone", p.Hot()}} {
			for _, c := range obstacleReaches(ck.req.Exit, ck.obstacles, z.env, capture) {
				run := z.env.Length - c.x
				r := math.Max(z.env.Radius(c.x), z.env.Radius(c.x+reachStepFraction*z.env.Radius(c.x)))
				out = append(out, splash{
					point: p.Name, zone: z.name, obstacle: c.obstacle, x: c.x,
					at:    ck.req.Exit.ToCell(geometry.JetPoint{X: c.x}),
					reach: run + r, radius: r,
				})
			}
		}
	}
	return out
}

// inSplash returns the first splash region that any of the points pts (cell
// frame, m) lies in, less pen (m, the radius of the part at each point),
// with its distance from the struck obstacle; ok is false when none is. A
// point is in the region when it is within reach of the contact and, at a
// distance s from it, within radius + splashDepthRatio·s of the obstacle.
func (ck *checker) inSplash(pts []r3.Vec, pen float64) (s splash, d float64, ok bool) {
	for _, s := range ck.splashes {
		o := ck.req.Cell.Obstacles[s.obstacle].Solid()
		for _, q := range pts {
			dq := o.Distance(q) - pen
			run := math.Max(0, r3.Norm(r3.Sub(q, s.at))-pen)
			if run <= s.reach && dq <= s.radius+splashDepthRatio*run {
				return s, math.Max(dq, 0), true
			}
		}
	}
	return splash{}, 0, false
}

// splashCheck turns the obstacle check c of station st (nearest names the
// obstacle nearest to it) into a warning when
// its microphone, pole, base or arm (samples arm, each of radius armPen, m)
// is in the splash region of a struck obstacle.
func (ck *checker) splashCheck(c *Check, nearest string, st *Station, arm []r3.Vec, armPen float64) {
	if len(ck.splashes) == 0 {
		return
	}
	pts := []r3.Vec{st.Mic}
	pen := 0.0
	if st.Stand != nil {
		b := r3.Vec{X: st.Base[0], Y: st.Base[1]}
		pts = append(pts, b, r3.Vec{X: b.X, Y: b.Y, Z: st.Mic.Z})
		pen = math.Max(st.Stand.BaseRadius, st.Stand.PoleDiameter/2)
	}
	s, d, ok := ck.inSplash(pts, pen)
	if !ok && len(arm) > 0 {
		s, d, ok = ck.inSplash(arm, armPen)
	}
	if !ok {
		return
	}
	c.Verdict = Warn
	c.Point = s.point
	name := ck.req.Cell.Obstacles[s.obstacle].Name
	lead := fmt.Sprintf("%s from %s", ck.m(d), name)
	if name != nearest {
		lead = fmt.Sprintf("%s from %s, %s from %s", ck.m(c.Value), nearest, ck.m(d), name)
	}
	c.Reason = fmt.Sprintf("%s, which the %s of %s strikes about %s downstream of the exit: the exhaust spreads along its faces as a wall jet that the free-jet model does not describe; move the station clear of it",
		lead, s.zone, s.point, ck.m(s.x))
}

// impingements returns where the conservative zones of points reach the
// boundary, the floor, the ceiling or an obstacle (indexed in obstacles) of
// req's cell upstream of the collector, point by point, velocity zone
// first: Plan.Impingements.
func impingements(req *Request, obstacles *geometry.Index, points []PointResult) []Impingement {
	names := map[surface]string{surfaceBoundary: SurfaceBoundary, surfaceFloor: SurfaceFloor, surfaceCeiling: SurfaceCeiling, surfaceObstacle: SurfaceObstacle}
	var out []Impingement
	for k := range points {
		p := &points[k]
		if p.Plume == nil {
			continue
		}
		capture := captureX(req, p)
		for _, env := range []*jet.Envelope{p.Velocity(), p.Hot()} {
			for _, c := range zoneReaches(req, obstacles, env, capture) {
				im := Impingement{Point: p.Name, Zone: env.Zone, Surface: names[c.surface], X: c.x, At: c.at}
				if c.surface == surfaceObstacle {
					im.Obstacle = req.Cell.Obstacles[c.obstacle].Name
				}
				out = append(out, im)
			}
		}
	}
	return out
}
