package planner

import (
	"fmt"
	"math"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/units"
)

// plumeEdgeFraction is the velocity, as a fraction of the centreline value,
// that bounds the plume for the collector-capture check: 5 %, at
// r = 2.0789·r½ of a Gaussian profile (reference sheet §11, DERIVED; the
// "5 % edge" is common practice for a jet's width).
const plumeEdgeFraction = 0.05

// captureSpill is the plume-to-collector diameter ratio above which the
// collector is judged not to capture the plume (blocked); between 1 and this
// the capture is marginal (warn). Common practice: collectors are sized with
// margin, and a plume 25 % wider than the inlet spills visibly.
const captureSpill = 1.25

// predict runs the plume model for every operating point.
func predict(req *Request, lim Limits) ([]PointResult, error) {
	out := make([]PointResult, 0, len(req.Points))
	for i, c := range req.Points {
		c.Ambient = req.Ambient.JetAmbient()
		p, err := jet.NewPlume(req.Nozzle, c, jet.Limits{Velocity: lim.Velocity, Temperature: lim.Temperature})
		if err != nil {
			return nil, fmt.Errorf("planner: operating point %d (%s): %w", i+1, c.Name, err)
		}
		e := p.Exit()
		pr := PointResult{
			Name:             c.Name,
			Condition:        c,
			Plume:            p,
			Exit:             e,
			CoreNominal:      p.CoreLength(jet.Nominal),
			CoreConservative: p.CoreLength(jet.Conservative),
			Flags:            p.Flags(),
		}
		_, length := acoustics.SourceExtent(req.Band.Low, e.FullyExpandedDiameter, e.Velocity)
		pr.SourceEnd = math.Max(length, pr.CoreConservative)
		pr.Capture, pr.CaptureReason, pr.CaptureDiameter = capture(req, &pr)
		out = append(out, pr)
	}
	return out, nil
}

// capture compares the plume at the collector inlet with the collector.
func capture(req *Request, p *PointResult) (Verdict, string, float64) {
	col := req.Cell.Collector
	if col == nil {
		return OK, "no exhaust collector in the layout", 0
	}
	m := func(x float64) string { return units.FormatLengthApprox(x, req.System()) }
	q := req.Exit.ToJet(col.Inlet)
	if q.X <= 0 {
		return Blocked, fmt.Sprintf("the collector inlet is %s upstream of the nozzle exit", m(-q.X)), 0
	}
	// the conservative field's 5 % edge: a capture judged on the nominal
	// plume (which carries only part of the exit momentum) would call a
	// spilling hood clear, and silence the warnings downstream of it
	edge := p.Plume.EdgeRadius(jet.Conservative, q.X, plumeEdgeFraction)
	off := q.R // the inlet centre may sit off the axis
	if pt, ok := bentAt(p.Plume.Bent(), q.X); ok {
		// a buoyant plume may pass over (or under) the inlet: measure the
		// inlet's offset from the bent path too, and the bent plume's own
		// 5 % edge (the widths of plume entrainment, conservative)
		v := col.Inlet.Z - req.Exit.Exit.Z
		l := math.Sqrt(math.Max(0, q.R*q.R-v*v))
		off = math.Max(off, math.Hypot(v-pt.Z, l))
		edge = math.Max(edge, jet.BentEdge(pt, plumeEdgeFraction))
	}
	d := 2 * edge
	need := 2 * (edge + off)
	ratio := need / col.Diameter
	desc := fmt.Sprintf("plume %s wide (5 %% velocity edge, conservative) at the inlet %s downstream, collector %s", m(d), m(q.X), m(col.Diameter))
	if off > 0.001 {
		desc += fmt.Sprintf(", inlet %s off the plume's axis", m(off))
	}
	switch {
	case ratio <= 1:
		return OK, desc, d
	case ratio <= captureSpill:
		return Warn, desc + fmt.Sprintf(": the edge of the plume spills (%.0f %% of the inlet)", 100*ratio), d
	}
	return Blocked, desc + fmt.Sprintf(": the plume does not fit the collector (%.0f %% of the inlet); exhaust will spill into the cell", 100*ratio), d
}

// governing returns the index of the point whose conservative velocity
// zone has the largest meridian area, and of the point whose conservative
// hot zone is the longest (the first of them when none is hot).
func governing(points []PointResult) (vel, hot int) {
	area, length := -1.0, 0.0
	for i := range points {
		if a := outlineArea(points[i].Velocity()); a > area {
			vel, area = i, a
		}
	}
	hot = vel
	for i := range points {
		if l := points[i].Hot().Length; l > length {
			hot, length = i, l
		}
	}
	return vel, hot
}

// outlineArea is the area of an envelope's meridian outline, m².
func outlineArea(e *jet.Envelope) float64 {
	a := 0.0
	p := e.Points
	for i := 1; i < len(p); i++ {
		a += (p[i][0] - p[i-1][0]) * (p[i][1] + p[i-1][1]) / 2
	}
	return a
}

// edgeLine returns the straight line from the nozzle lip that stays outside
// every point's conservative velocity zone between x0 and x1: the near-field
// line's angle, governed by the widest point.
func edgeLine(points []PointResult, x0, x1 float64) nearLine {
	l := nearLine{}
	for i := range points {
		e := points[i].Velocity()
		if r := e.Radius(0); r > l.r0 {
			l.r0 = r
		}
	}
	const n = 200
	for i := range points {
		e := points[i].Velocity()
		for k := 0; k <= n; k++ {
			x := x0 + (x1-x0)*float64(k)/n
			if x <= 0 {
				continue
			}
			if s := (e.Radius(x) + e.Tolerance - l.r0) / x; s > l.slope {
				l.slope = s
			}
		}
	}
	return l
}

// sourceAxis returns sample points on the jet axis from the exit to x, for
// sight lines.
func sourceAxis(f geometry.JetFrame, x float64, n int) []geometry.JetPoint {
	out := make([]geometry.JetPoint, n)
	for i := range out {
		out[i] = geometry.JetPoint{X: x * float64(i) / float64(n-1)}
	}
	return out
}

// bentAt interpolates the bent path of bp at axial distance x (m); ok is
// false without a bent plume or past its end.
func bentAt(bp *jet.BentPlume, x float64) (jet.BentPoint, bool) {
	if bp == nil {
		return jet.BentPoint{}, false
	}
	for i := 1; i < len(bp.Path); i++ {
		a, b := bp.Path[i-1], bp.Path[i]
		if b.X >= x && b.X > a.X {
			u := math.Max(0, (x-a.X)/(b.X-a.X))
			pt := a
			pt.X, pt.Z = x, a.Z+u*(b.Z-a.Z)
			pt.Width = a.Width + u*(b.Width-a.Width)
			return pt, true
		}
	}
	return jet.BentPoint{}, false
}
