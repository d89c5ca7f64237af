package jet

import (
	"math"
	"sort"
)

// Zone is the kind of closed zone an envelope bounds.
type Zone int

// Zones.
const (
	VelocityZone Zone = iota + 1 // mean velocity above the velocity limit
	HotZone                      // total temperature above the temperature limit
)

func (z Zone) String() string {
	if z == HotZone {
		return "hot zone"
	}
	return "velocity zone"
}

// Variant selects the constants behind a prediction.
type Variant int

// Variants.
const (
	Nominal      Variant = iota + 1 // central values: tables
	Conservative                    // the end of the scatter that makes zones bigger: clearances
)

func (v Variant) String() string {
	if v == Conservative {
		return "conservative"
	}
	return "nominal"
}

// The points inside a sampling interval where an outline's chord gap is
// measured.
var (
	midOnly  = []float64{0.5}
	quarters = []float64{0.25, 0.5, 0.75}
)

// envelopeSamples is the number of axial intervals of an envelope outline.
const envelopeSamples = 96

// cosineSpacing holds the sampling positions of an outline as fractions of
// its length, (1 − cos(π·i/n))/2.
var cosineSpacing = func() [envelopeSamples + 1]float64 {
	var s [envelopeSamples + 1]float64
	for i := range s {
		s[i] = (1 - math.Cos(math.Pi*float64(i)/envelopeSamples)) / 2
	}
	return s
}()

// Envelope is a closed zone of the jet: the body of revolution about the jet
// axis whose meridian is r ≤ Radius(x) for 0 ≤ x ≤ Length.
type Envelope struct {
	Zone    Zone
	Variant Variant
	// Limit is the velocity (m/s) or temperature (K) the zone is bounded by.
	Limit float64
	// Length is the axial reach of the zone from the exit plane, m; 0 when
	// the jet never exceeds the limit.
	Length float64
	// MaxRadius is the largest radius of the zone, m, found at MaxRadiusAt.
	MaxRadius, MaxRadiusAt float64
	// Points is the outline in (x, r), metres: from (0, 0) up the exit plane
	// to the lip, along the edge, to the tip (Length, 0).
	Points [][2]float64
	// Tolerance bounds how far, m, the straight segments of Points may lie
	// inside the exact zone; Clearance subtracts it.
	Tolerance float64

	radius func(x float64) float64
}

// Radius returns the exact radius of the zone at x (m), 0 outside
// [0, Length].
func (e *Envelope) Radius(x float64) float64 {
	if e.radius == nil || x < 0 || x > e.Length {
		return 0
	}
	return e.radius(x)
}

// Contains reports whether the point at axial distance x and distance r from
// the axis lies in the zone. Points on the boundary are inside.
func (e *Envelope) Contains(x, r float64) bool {
	if e.Length == 0 || x < 0 || x > e.Length {
		return false
	}
	return math.Abs(r) <= e.Radius(x)
}

// Clearance returns the distance (m) from the point (x, r) of the jet frame
// to the zone, less the outline's Tolerance: positive outside, negative
// inside (minus the depth), +Inf when the zone is empty. Because the zone is
// a body of revolution, the distance in the meridian half-plane is the 3-D
// distance; it never increases as the point moves toward the axis.
func (e *Envelope) Clearance(x, r float64) float64 {
	if e.Length == 0 || len(e.Points) < 2 {
		return math.Inf(1)
	}
	r = math.Abs(r)
	d := e.outlineDistance(x, r)
	// a point inside the zone, or inside the outline where a chord bulges
	// out of the exact zone, is given no positive clearance
	if e.Contains(x, r) || e.insideOutline(x, r) {
		return -d - e.Tolerance
	}
	return d - e.Tolerance
}

// outlineRadius returns the radius of the outline at x, linearly
// interpolated, plus the Tolerance: never less than the exact radius
// (m; 0 outside [0, Length]). It is cheaper than Radius.
func (e *Envelope) outlineRadius(x float64) float64 {
	p := e.Points
	if x < 0 || x > e.Length || len(p) < 3 {
		return 0
	}
	i := sort.Search(len(p)-1, func(i int) bool { return p[i+1][0] >= x }) + 1
	if i >= len(p) {
		return 0
	}
	a, b := p[i-1], p[i]
	r := max(a[1], b[1])
	if i > 1 && b[0] > a[0] {
		r = a[1] + (b[1]-a[1])*(x-a[0])/(b[0]-a[0])
	}
	return r + e.Tolerance
}

// insideOutline reports whether (x, r) lies inside the outline polygon: r
// at most the outline's radius, linearly interpolated, at x.
func (e *Envelope) insideOutline(x, r float64) bool {
	p := e.Points
	if x < 0 || x > e.Length || len(p) < 3 {
		return false
	}
	// p[1:] runs from the exit lip to the tip with x non-decreasing
	i := sort.Search(len(p)-1, func(i int) bool { return p[i+1][0] >= x }) + 1
	if i >= len(p) {
		return false
	}
	if i == 1 {
		return r <= p[1][1]
	}
	a, b := p[i-1], p[i]
	if b[0] == a[0] {
		return r <= max(a[1], b[1])
	}
	return r <= a[1]+(b[1]-a[1])*(x-a[0])/(b[0]-a[0])
}

// outlineDistance returns the distance from (x, r) to the outline polyline,
// excluding the closing segment along the axis. The outline's x never
// decreases after the first (exit-plane) segment, so the search starts at
// the segment nearest x and stops once the axial gap alone exceeds the best
// distance found.
func (e *Envelope) outlineDistance(x, r float64) float64 {
	p := e.Points
	n := len(p) - 1 // segments i: p[i]→p[i+1]
	// squared distances in the loop; one square root at the end
	best := segmentDistanceSquared(x, r, p[0], p[1]) // the exit plane
	k := sort.Search(n-1, func(i int) bool { return p[i+2][0] >= x }) + 1
	if k > n-1 {
		k = n - 1
	}
	for i := k; i >= 1; i-- {
		if g := x - p[i+1][0]; g > 0 && g*g > best {
			break
		}
		best = min(best, segmentDistanceSquared(x, r, p[i], p[i+1]))
	}
	for i := k + 1; i < n; i++ {
		if g := p[i][0] - x; g > 0 && g*g > best {
			break
		}
		best = min(best, segmentDistanceSquared(x, r, p[i], p[i+1]))
	}
	return math.Sqrt(best)
}

// segmentDistanceSquared returns the squared distance from (x, r) to the
// segment ab.
func segmentDistanceSquared(x, r float64, a, b [2]float64) float64 {
	dx, dr := b[0]-a[0], b[1]-a[1]
	l2 := dx*dx + dr*dr
	t := 0.0
	if l2 > 0 {
		t = ((x-a[0])*dx + (r-a[1])*dr) / l2
		t = max(0, min(1, t))
	}
	ex, er := x-(a[0]+t*dx), r-(a[1]+t*dr)
	return ex*ex + er*er
}

// newEnvelope samples radius on [0, length] into an outline. kinks are axial
// positions where the radius has a corner; they become vertices.
func newEnvelope(z Zone, v Variant, limit, length float64, radius func(float64) float64, kinks ...float64) Envelope {
	return newEnvelopePeak(z, v, limit, length, radius, nil, nil, kinks...)
}

// newEnvelopePeak is newEnvelope for a radius whose widest point is known
// (x, r): the search for it is skipped. Where smooth(x) is false at either
// end of an interval, the radius may have corners at unknown places there,
// and the chord's gap is measured at three points instead of one; a nil
// smooth means smooth everywhere.
func newEnvelopePeak(z Zone, v Variant, limit, length float64, radius func(float64) float64, peak *[2]float64, smooth func(float64) bool, kinks ...float64) Envelope {
	e := Envelope{Zone: z, Variant: v, Limit: limit, radius: radius}
	if math.IsNaN(length) || math.IsInf(length, 0) {
		// not "no zone": NewPlume refuses a prediction with a non-finite
		// number in it
		e.Length = length
		return e
	}
	if !(length > 0) {
		return e
	}
	e.Length = length
	xs := make([]float64, 0, envelopeSamples+1+len(kinks))
	for _, s := range cosineSpacing {
		// cosine spacing: dense at the exit and at the tip, where the
		// radius changes fastest
		xs = append(xs, length*s)
	}
	for _, k := range kinks {
		if k > 0 && k < length {
			i := sort.SearchFloat64s(xs, k)
			xs = append(xs, 0)
			copy(xs[i+1:], xs[i:])
			xs[i] = k
		}
	}
	e.Points = make([][2]float64, 0, len(xs)+1)
	e.Points = append(e.Points, [2]float64{0, 0})
	prevX, prevR := -1.0, 0.0
	for i, x := range xs {
		if x == prevX {
			continue
		}
		r := radius(x)
		if i == len(xs)-1 {
			r = 0
		}
		e.Points = append(e.Points, [2]float64{x, r})
		if r > e.MaxRadius {
			e.MaxRadius, e.MaxRadiusAt = r, x
		}
		if prevX >= 0 {
			// the chord may cut inside a convex stretch of the zone: the
			// gap at the midpoint, times 1.25, bounds it both where the
			// edge is near-parabolic (max at the midpoint) and at the tip,
			// where r ∝ sqrt(L − x) (max 1.21 × the midpoint gap)
			// (derived); a corner inside the interval needs the finer
			// measure of three points
			ts := midOnly
			if smooth != nil && (!smooth(prevX) || !smooth(x)) {
				ts = quarters
			}
			for _, t := range ts {
				xm := prevX + t*(x-prevX)
				rm := radius(xm)
				e.Tolerance = math.Max(e.Tolerance, 1.25*(rm-(prevR+t*(r-prevR))))
				if rm > e.MaxRadius {
					e.MaxRadius, e.MaxRadiusAt = rm, xm
				}
			}
		}
		prevX, prevR = x, r
	}
	if peak != nil && peak[1] >= e.MaxRadius {
		e.MaxRadiusAt, e.MaxRadius = peak[0], peak[1]
	} else {
		e.refineMax()
	}
	return e
}

// refineMax polishes MaxRadius with a golden-section search around the best
// sample.
func (e *Envelope) refineMax() {
	if e.MaxRadius == 0 {
		return
	}
	step := e.Length * math.Pi / envelopeSamples
	lo, hi := math.Max(0, e.MaxRadiusAt-step), math.Min(e.Length, e.MaxRadiusAt+step)
	const g = 0.6180339887498949
	a, b := hi-g*(hi-lo), lo+g*(hi-lo)
	fa, fb := e.radius(a), e.radius(b)
	// 25 golden steps narrow the bracket to 6e-6 of its width
	for i := 0; i < 25; i++ {
		if fa > fb {
			hi, b, fb = b, a, fa
			a = hi - g*(hi-lo)
			fa = e.radius(a)
		} else {
			lo, a, fa = a, b, fb
			b = lo + g*(hi-lo)
			fb = e.radius(b)
		}
	}
	x := (lo + hi) / 2
	if r := e.radius(x); r > e.MaxRadius {
		e.MaxRadius, e.MaxRadiusAt = r, x
	}
}
