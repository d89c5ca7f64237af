package planner

import (
	"math"

	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/jet"
)

// A buoyant jet's zones are checked twice: about the straight axis (the
// envelopes of revolution) and about the bent path of the integral model
// (jet.BentPlume). Either may be right, so a station's clearance is the
// smaller of the two.

// bentProbe is a point of a station's hardware for the bent-zone check: x
// along the jet axis, v above it, l beside the vertical plane through it
// (m), with the radius of the part about the point (m).
type bentProbe struct {
	c            r3.Vec // the point in the cell frame, m
	x, v, l, pen float64
	part         string
}

// bentPoleStep is the largest spacing of the samples of a stand's pole,
// m: the bent zone is not a body of revolution about the axis, so the
// pole's nearest point is not known in advance.
const bentPoleStep = 0.05

// bentProbes returns station st's microphone, pole, base and boom as
// bent-zone probes. Every point of the pole and boom lies within its
// probe's pen of a probe.
func (ck *checker) bentProbes(st *Station) []bentProbe {
	at := ck.probeAt
	out := []bentProbe{at(st.Mic, 0, "microphone")}
	s := st.Stand
	if s == nil {
		return out
	}
	top := st.Mic.Z
	bottom := math.Min(s.BaseHeight, top)
	if l := top - bottom; l > 0 {
		n := max(2, min(int(math.Ceil(l/bentPoleStep)), 200))
		h := l / float64(n)
		for i := 0; i <= n; i++ {
			z := bottom + float64(i)*h
			out = append(out, at(r3.Vec{X: st.Base[0], Y: st.Base[1], Z: z}, s.PoleDiameter/2+h/2, "stand pole"))
		}
	}
	out = append(out, at(r3.Vec{X: st.Base[0], Y: st.Base[1], Z: s.BaseHeight / 2}, math.Hypot(s.BaseRadius, s.BaseHeight/2), "stand base"))
	b := r3.Vec{X: st.Base[0], Y: st.Base[1], Z: top}
	if arm := math.Hypot(st.Mic.X-b.X, st.Mic.Y-b.Y); arm > 1e-3 {
		n := max(2, min(int(math.Ceil(arm/boomStep)), 64))
		h := arm / float64(n)
		for i := 0; i <= n; i++ {
			out = append(out, at(r3.Add(b, r3.Scale(float64(i)/float64(n), r3.Sub(st.Mic, b))), h/2+s.PoleDiameter/2, "boom"))
		}
	}
	return out
}

// bentClearance returns the smallest clearance of the probes from zone z of
// the bent plume, less each probe's radius, and the part that sets it;
// +Inf when the bent zone is empty. Probes farther than best from the
// zone's bounding box are skipped.
func bentClearance(bp *jet.BentPlume, z jet.Zone, probes []bentProbe, best float64) (float64, string) {
	if bp == nil || len(bp.Path) < 2 {
		return math.Inf(1), ""
	}
	xmin, xmax, vmin, vmax, rmax := math.Inf(1), math.Inf(-1), math.Inf(1), math.Inf(-1), 0.0
	for i, pt := range bp.Path {
		// both ends of every segment with a tube: the last segment of a
		// zone runs to the first point where its radius is 0
		r := pt.Radius(z)
		if r > 0 || (i > 0 && bp.Path[i-1].Radius(z) > 0) {
			xmin, xmax = math.Min(xmin, pt.X), math.Max(xmax, pt.X)
			vmin, vmax = math.Min(vmin, pt.Z), math.Max(vmax, pt.Z)
			rmax = math.Max(rmax, r)
		}
	}
	if rmax == 0 {
		return math.Inf(1), ""
	}
	min, part := math.Inf(1), ""
	for _, p := range probes {
		dx := math.Max(0, math.Max(xmin-p.x, p.x-xmax))
		dv := math.Max(0, math.Max(vmin-p.v, p.v-vmax))
		if lb := math.Sqrt(dx*dx+dv*dv+p.l*p.l) - rmax - bp.Tolerance - p.pen; lb >= math.Min(min, best) {
			continue
		}
		if c := bp.Clearance(z, p.x, p.v, p.l) - p.pen; c < min || math.IsNaN(c) {
			min, part = c, p.part
			if math.IsNaN(c) {
				return c, part
			}
		}
	}
	return min, part
}
