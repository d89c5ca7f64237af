package planner

import (
	"fmt"
	"math"

	"github.com/paulmach/orb"
	"gonum.org/v1/gonum/spatial/r3"

	"arcwright/internal/geometry"
)

// angleTolerance is the slack, rad, with which the last step of an angle
// range counts as reaching its end (1e-9 rad: rounding only).
const angleTolerance = 1e-9

// flushRadius is the plan radius of a microphone mounted flush in the floor
// or on a ground plate, m: its footprint for the spacing check (common
// practice: ground plates are about 0.4 m across, ICAO Annex 16 from
// memory, but flush capsules are only a few centimetres).
const flushRadius = 0.02

// steps returns from, from ± step, … up to to (inclusive within rounding).
// step must be > 0.
func steps(from, to, step float64) []float64 {
	if step <= 0 || math.IsNaN(step) {
		return nil
	}
	dir := 1.0
	if to < from {
		dir = -1
	}
	n := int(math.Floor(math.Abs(to-from)/step + angleTolerance*1e3))
	out := make([]float64, 0, n+1)
	for i := 0; i <= n; i++ {
		out = append(out, from+dir*float64(i)*step)
	}
	return out
}

// spot is one station as placed, before it is checked.
type spot struct {
	mic     r3.Vec
	nominal float64 // requested polar angle in the layout convention, or NaN
	name    string  // explicit ID, or ""
	channel int     // explicit channel, or 0
}

// placer places the stations of one array.
type placer struct {
	req   *Request
	stand *Stand // nil: flush on the floor
}

// centre returns the point on the axis the array's radii and angles are
// seen from.
func (pl placer) centre(a *Array) r3.Vec {
	switch a.Kind {
	case Arc, Line:
		return pl.req.Exit.ToCell(geometry.JetPoint{X: a.CenterX})
	case Ring:
		return pl.req.Exit.ToCell(geometry.JetPoint{X: a.RingX})
	}
	return pl.req.Exit.Exit
}

// side returns +1 for the left of the jet and −1 for the right, from an
// azimuth.
func side(azimuth float64) float64 {
	if math.Cos(azimuth) < 0 {
		return -1
	}
	return 1
}

// lateral returns the point x downstream on the axis offset by d to the side
// given by azimuth, either in the plane through the axis at that azimuth or,
// when horizontal, at height h.
func (pl placer) lateral(x, d float64, a *Array) r3.Vec {
	f := pl.req.Exit
	if !a.HasHeight {
		return f.ToCell(geometry.JetPoint{X: x, R: d, Azimuth: a.Azimuth})
	}
	p := f.ToCell(geometry.JetPoint{X: x, R: side(a.Azimuth) * d, Azimuth: 0})
	p.Z = a.Height
	return p
}

// arcPoint returns the microphone of an arc at downstream polar angle
// thetaJ (rad) and radius r (m).
func (pl placer) arcPoint(a *Array, thetaJ, r float64) r3.Vec {
	s, c := math.Sincos(thetaJ)
	p := pl.lateral(a.CenterX+r*c, r*s, a)
	if pl.stand == nil {
		p.Z = 0
	}
	return p
}

// spots places the stations of array a with arc radius r; nearEdge is the
// near-field line (r = r0 + slope·x) for NearField arrays.
func (pl placer) spots(a *Array, r float64, edge nearLine) ([]spot, []string) {
	conv := pl.req.Convention
	var out []spot
	var notes []string
	add := func(p r3.Vec, nominal float64) {
		if pl.stand == nil {
			p.Z = 0
		}
		out = append(out, spot{mic: p, nominal: nominal})
	}
	switch a.Kind {
	case Arc:
		for _, th := range steps(a.From, a.To, a.Step) {
			out = append(out, spot{mic: pl.arcPoint(a, conv.ToDownstream(th), r), nominal: th})
		}
	case Line:
		if a.Spacing > 0 {
			for _, x := range steps(a.XFrom, a.XTo, a.Spacing) {
				add(pl.lateral(x, a.Offset, a), math.NaN())
			}
			break
		}
		for _, th := range steps(a.From, a.To, a.Step) {
			tj := conv.ToDownstream(th)
			if math.Sin(tj) < 1e-6 {
				notes = append(notes, fmt.Sprintf("%s %.4g° is along the axis: a line parallel to the axis never reaches it; left out", conv.Symbol(), th*180/math.Pi))
				continue
			}
			add(pl.lateral(a.CenterX+a.Offset/math.Tan(tj), a.Offset, a), th)
		}
	case NearField:
		for _, x := range steps(a.XFrom, a.XTo, a.Spacing) {
			add(pl.lateral(x, edge.at(x)+a.Clearance/math.Cos(math.Atan(edge.slope)), a), math.NaN())
		}
	case Ring:
		f := pl.req.Exit
		clipped := 0
		for _, az := range steps(a.AzFrom, a.AzTo, a.AzStep) {
			p := f.ToCell(geometry.JetPoint{X: a.RingX, R: a.Radius, Azimuth: az})
			if p.Z < 0 || (pl.req.Cell.Bounded() && !pl.req.Cell.Contains(orb.Point{p.X, p.Y})) || p.Z > pl.req.Cell.Ceiling {
				clipped++
				continue
			}
			add(p, math.NaN())
		}
		if clipped > 0 {
			notes = append(notes, fmt.Sprintf("%d of the ring's azimuths fall below the floor, above the ceiling or outside the room; left out", clipped))
		}
	case Points, Probes:
		for _, fx := range a.Fixed {
			at := fx.At
			if pl.stand == nil {
				at.Z = 0 // no stand: a microphone flush on the floor
			}
			out = append(out, spot{mic: at, nominal: math.NaN(), name: fx.Name, channel: fx.Channel})
		}
	}
	return out, notes
}

// seenFrom returns the point on the axis from which a station's radius and
// polar angle are measured, and its acoustic distance: the arc centre for
// arcs, the centre of a polar-stepped line, and the nozzle exit otherwise
// (a ring's or a sideline's microphones hear the jet from the exit region,
// not from the foot of their perpendicular on the axis).
func seenFrom(req *Request, a *Array) r3.Vec {
	switch {
	case a.Kind == Arc, a.Kind == Line && a.Spacing == 0:
		return req.Exit.ToCell(geometry.JetPoint{X: a.CenterX})
	}
	return req.Exit.Exit
}

// standBase returns the plan position of the pole for a microphone at mic:
// the boom, of length boom (m), runs horizontally from the pole to the
// microphone. For an arc in a horizontal plane the pole stands on the
// radius from the arc centre, so that the boom points the microphone at the
// source; otherwise it stands to the side of the microphone away from the
// jet axis (an overhead or underneath microphone swings its pole to the side
// the array's azimuth names), so that no pole is planted on the axis.
func standBase(mic, centre r3.Vec, boom float64, f geometry.JetFrame, a *Array) orb.Point {
	if boom <= 0 {
		return orb.Point{mic.X, mic.Y}
	}
	var dx, dy float64
	if a.Kind == Arc && (a.HasHeight || math.Abs(math.Sin(a.Azimuth)) < 0.5) {
		dx, dy = mic.X-centre.X, mic.Y-centre.Y
	} else {
		// away from the axis, across it in plan
		foot := f.ToCell(geometry.JetPoint{X: f.ToJet(mic).X})
		dx, dy = mic.X-foot.X, mic.Y-foot.Y
	}
	l := math.Hypot(dx, dy)
	if l < 1e-6 {
		// directly above or below the axis (or the arc centre): to the
		// side of the jet the array's azimuth points to
		h := f.Heading + side(a.Azimuth)*math.Pi/2
		dx, dy, l = math.Cos(h), math.Sin(h), 1
	}
	return orb.Point{mic.X + boom*dx/l, mic.Y + boom*dy/l}
}

// nearLine is a straight line r = r0 + slope·x in the jet frame.
type nearLine struct{ r0, slope float64 }

func (l nearLine) at(x float64) float64 { return l.r0 + l.slope*x }
