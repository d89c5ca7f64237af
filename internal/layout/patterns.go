package layout

import (
	"math"

	"github.com/paulmach/orb"
	"go.yaml.in/yaml/v3"

	"arcwright/internal/planner"
	"arcwright/internal/units"
)

var (
	arcKeys   = []string{"centre", "radius", "polar", "azimuth", "height"}
	lineKeys  = []string{"offset", "from", "to", "spacing", "polar", "centre", "azimuth", "height"}
	nearKeys  = []string{"clearance", "from", "to", "spacing", "azimuth"}
	ringKeys  = []string{"x", "radius", "azimuth", "count"}
	pointKeys = []string{"name", "at", "channel"}
	probeKeys = []string{"name", "at"}
	rangeKeys = []string{"from", "to", "step"}
)

// AngleTol is the tolerance on the bounds of an angle, rad: a polar angle
// written as 180 deg may convert to a hair above π.
const AngleTol = 1e-9

// stepCountTol is the relative slack, in steps, when counting the stations
// of a range, so that 30 to 150 deg by 10 deg counts 13 despite rounding.
const stepCountTol = 1e-9

// steps returns the number of stations from a to b by step: ⌊|b−a|/step⌋+1.
func steps(a, b, step float64) float64 { return math.Floor(math.Abs(b-a)/step+stepCountTol) + 1 }

// angleIn reads an angle, rad, that must lie in [0, hi] within AngleTol;
// hiText names hi for the message.
func (d *decoder) angleIn(n *yaml.Node, field string, hi float64, hiText string) (float64, bool) {
	v, ok := d.angle(n, field)
	if ok && (v < -AngleTol || v > hi+AngleTol) {
		d.errorf(ErrInvalid, n.Line, field, "want an angle from 0 deg to %s, got %s", hiText, units.FormatAngleDeg(v))
		return v, false
	}
	return v, ok
}

// angleRange reads {from, to, step} held by key in s: from and to in
// [0, hi], step greater than 0. From may exceed To.
func (d *decoder) angleRange(s *section, key string, hi float64, hiText string) (from, to, step float64, ok bool) {
	r := s.sub(key, rangeKeys)
	okF, okT, okS := false, false, false
	if n := r.need("from", "the first angle, such as 30 deg"); n != nil {
		from, okF = d.angleIn(n, r.field("from"), hi, hiText)
	}
	if n := r.need("to", "the last angle, such as 150 deg"); n != nil {
		to, okT = d.angleIn(n, r.field("to"), hi, hiText)
	}
	if n := r.need("step", "the step between stations, such as 10 deg"); n != nil {
		if step, okS = d.angle(n, r.field("step")); okS && step <= 0 {
			d.errorf(ErrInvalid, n.Line, r.field("step"), "the step must be greater than 0 deg, got %s", units.FormatAngleDeg(step))
			okS = false
		}
	}
	if okF && okT && okS {
		// the last station falls short of "to" when the span is not a
		// whole number of steps
		span := math.Abs(to - from)
		k := math.Floor(span/step + 1e-6)
		last := from + math.Copysign(k*step, to-from)
		// no warning when the shortfall does not show at the printed 0.1°
		if span-k*step > 1e-6*step && units.FormatAngleDeg(last) != units.FormatAngleDeg(to) {
			d.warnf(r.line, r.field("to"), "the steps from %s by %s stop at %s, short of %s", units.FormatAngleDeg(from), units.FormatAngleDeg(step), units.FormatAngleDeg(last), units.FormatAngleDeg(to))
		}
	}
	return from, to, step, okF && okT && okS
}

// azimuth reads the optional side of the jet held by key, rad in [0, 2π].
func (d *decoder) azimuth(s *section, key string) (float64, bool) {
	n := s.get(key)
	if n == nil {
		return 0, true
	}
	return d.angleIn(n, s.field(key), 2*math.Pi, "360 deg")
}

// height reads the optional height of a horizontal arc or line, m, into a.
func (d *decoder) height(s *section, a *planner.Array, ci *cellInfo) bool {
	n := s.get("height")
	if n == nil {
		return true
	}
	h, ok := d.length(n, s.field("height"))
	if ok {
		ok = d.heightRange(ci, h, n.Line, s.field("height"), "the height of the stations")
	}
	a.Height, a.HasHeight = h, true
	return ok
}

// all reports whether every value is true.
func all(oks ...bool) bool {
	for _, ok := range oks {
		if !ok {
			return false
		}
	}
	return true
}

// arc decodes an arc about a centre on the jet axis.
func (d *decoder) arc(s *section, a *planner.Array, ac *arrayContext) bool {
	p := s.sub("arc", arcKeys)
	a.Kind = planner.Arc
	okC, okR := true, false
	if n := p.get("centre"); n != nil {
		a.CenterX, okC = d.length(n, p.field("centre"))
	}
	if n := p.need("radius", "the arc radius, a length such as 5 m, or auto"); n != nil {
		if n.Kind == yaml.ScalarNode && n.Value == "auto" {
			a.AutoRadius, okR = true, true
		} else {
			a.Radius, okR = d.positiveLength(n, p.field("radius"), "the radius")
		}
	}
	var okP bool
	a.From, a.To, a.Step, okP = d.angleRange(p, "polar", math.Pi, "180 deg")
	var okA bool
	a.Azimuth, okA = d.azimuth(p, "azimuth")
	okH := d.height(p, a, ac.ci)
	if okP && !d.countCheck(s, steps(a.From, a.To, a.Step)) {
		okP = false
	}
	return all(okC, okR, okP, okA, okH)
}

// line decodes a sideline parallel to the jet axis: by axial range and
// spacing, or by polar angles seen from a centre on the axis.
func (d *decoder) line(s *section, a *planner.Array, ac *arrayContext) bool {
	p := s.sub("line", lineKeys)
	a.Kind = planner.Line
	okO := false
	if n := p.need("offset", "the distance from the jet axis, a length such as 2 m"); n != nil {
		a.Offset, okO = d.positiveLength(n, p.field("offset"), "the offset")
	}
	byX := p.has("from") || p.has("to") || p.has("spacing")
	okX := true
	switch {
	case byX && p.has("polar"):
		d.errorf(ErrInvalid, p.keyLine("polar"), p.field("polar"), "give from, to and spacing, or polar, not both")
		okX = false
	case byX:
		if p.has("centre") {
			d.errorf(ErrInvalid, p.keyLine("centre"), p.field("centre"), "centre applies only to a line by polar angles")
			okX = false
		}
		okX = d.axialRange(p, a, math.Inf(-1)) && okX
	case p.has("polar"):
		if n := p.get("centre"); n != nil {
			a.CenterX, okX = d.length(n, p.field("centre"))
		}
		var okP bool
		a.From, a.To, a.Step, okP = d.angleRange(p, "polar", math.Pi, "180 deg")
		if okP && !d.countCheck(s, steps(a.From, a.To, a.Step)) {
			okP = false
		}
		okX = okX && okP
	default:
		if p.isMap {
			d.errorf(ErrMissing, p.line, p.field("from"), "missing; want from, to and spacing (an axial range), or polar ({from, to, step} seen from centre)")
		}
		okX = false
	}
	var okA bool
	a.Azimuth, okA = d.azimuth(p, "azimuth")
	okH := d.height(p, a, ac.ci)
	return all(okO, okX, okA, okH)
}

// axialRange reads from, to and spacing of a line into a; from must be at
// least lo (m).
func (d *decoder) axialRange(p *section, a *planner.Array, lo float64) bool {
	okF, okT, okS := false, false, false
	if n := p.need("from", "the axial distance of the first station from the exit, a length"); n != nil {
		if a.XFrom, okF = d.length(n, p.field("from")); okF && a.XFrom < lo {
			d.errorf(ErrInvalid, n.Line, p.field("from"), "must not be upstream of the exit, got %s", d.fmtLen(a.XFrom))
			okF = false
		}
	}
	if n := p.need("to", "the axial distance of the last station from the exit, a length"); n != nil {
		a.XTo, okT = d.length(n, p.field("to"))
	}
	if n := p.need("spacing", "the spacing between stations, a length such as 0.25 m"); n != nil {
		a.Spacing, okS = d.positiveLength(n, p.field("spacing"), "the spacing")
	}
	if okF && okT && a.XTo < a.XFrom {
		d.errorf(ErrInvalid, p.keyLine("to"), p.field("to"), "the end (%s) must not be upstream of the start (%s)", d.fmtLen(a.XTo), d.fmtLen(a.XFrom))
		okT = false
	}
	if okF && okT && okS && !d.countCheck(p, steps(a.XFrom, a.XTo, a.Spacing)) {
		okS = false
	}
	return okF && okT && okS
}

// nearField decodes a line that follows the predicted plume edge.
func (d *decoder) nearField(s *section, a *planner.Array) bool {
	p := s.sub("near_field", nearKeys)
	a.Kind = planner.NearField
	okC := false
	if n := p.need("clearance", "the distance from the predicted plume edge, a length such as 0.15 m"); n != nil {
		a.Clearance, okC = d.positiveLength(n, p.field("clearance"), "the clearance")
	}
	okX := d.axialRange(p, a, 0)
	var okA bool
	a.Azimuth, okA = d.azimuth(p, "azimuth")
	return all(okC, okX, okA)
}

// ring3 decodes a ring of stations around the axis at one axial distance.
func (d *decoder) ring3(s *section, a *planner.Array) bool {
	p := s.sub("ring", ringKeys)
	a.Kind = planner.Ring
	okX, okR, okA := false, false, false
	if n := p.need("x", "the axial distance from the exit, a length such as 1 m"); n != nil {
		a.RingX, okX = d.length(n, p.field("x"))
	}
	if n := p.need("radius", "the distance from the axis, a length such as 0.8 m"); n != nil {
		a.Radius, okR = d.positiveLength(n, p.field("radius"), "the radius")
	}
	switch {
	case p.has("azimuth") && p.has("count"):
		d.errorf(ErrInvalid, p.keyLine("count"), p.field("count"), "give azimuth or count, not both")
	case p.has("count"):
		var n int
		if n, okA = d.integer(p.get("count"), p.field("count"), "a number of stations, a whole number from 1", 1); okA {
			okA = d.countCheck(s, float64(n))
			a.AzStep = 2 * math.Pi / float64(n)
			a.AzFrom, a.AzTo, a.FullTurn = 0, 2*math.Pi-a.AzStep, true
		}
	case p.has("azimuth"):
		a.AzFrom, a.AzTo, a.AzStep, okA = d.angleRange(p, "azimuth", 2*math.Pi, "360 deg")
		if okA {
			okA = d.countCheck(s, steps(a.AzFrom, a.AzTo, a.AzStep))
		}
	default:
		if p.isMap {
			d.errorf(ErrMissing, p.line, p.field("azimuth"), "missing; want azimuth ({from, to, step}) or count (stations equally spaced round a full turn)")
		}
	}
	return all(okX, okR, okA)
}

// fixed decodes points or probes (key): stations at given places. A
// station without a name keeps an empty Name: the planner gives it its ID
// (NAME-01, NAME-02 … after the array). Given names must be unique across
// every points and probes array.
func (d *decoder) fixed(s *section, key string, a *planner.Array, ac *arrayContext) bool {
	known, what := pointKeys, "point"
	a.Kind = planner.Points
	if key == "probes" {
		a.Kind, known, what = planner.Probes, probeKeys, "probe"
	}
	field := s.field(key)
	items, ok := d.list(s.get(key), field, s.keyLine(key), "a list of "+what+"s ({name, at: [x, y, z]})")
	if !ok {
		return false
	}
	if len(items) == 0 {
		d.errorf(ErrMissing, s.keyLine(key), field, "empty; want at least one %s", what)
		return false
	}
	if !d.countCheck(s, float64(len(items))) {
		return false
	}
	channels := map[int]int{}
	for i, it := range items {
		p := d.section(it, index(field, i), it.Line, known)
		f := planner.Fixed{Line: it.Line}
		good := p.isMap
		if n := p.get("name"); n != nil {
			var okN bool
			if f.Name, okN = d.text(n, p.field("name")); okN && f.Name == "" {
				d.errorf(ErrInvalid, n.Line, p.field("name"), "want a name, got an empty text (leave the key out to number the station after the array)")
				okN = false
			} else if okN {
				okN = d.checkLabel(f.Name, n.Line, p.field("name"), MaxNameLength)
			}
			if okN {
				ac.stations.add(f.Name, n.Line, p.field("name"))
			}
			good = good && okN
		}
		if n := p.need("at", "the position, [x, y, z] with z above the floor"); n != nil {
			var okAt bool
			if f.At, okAt = d.spacePoint(n, p.field("at"), p.keyLine("at")); okAt {
				okAt = d.heightRange(ac.ci, f.At.Z, p.keyLine("at"), p.field("at"), "the "+what)
			}
			if c := &ac.ci.cell; okAt && ac.ci.boundaryOK && c.Bounded() && !c.Contains(orb.Point{f.At.X, f.At.Y}) {
				d.errorf(ErrInvalid, p.keyLine("at"), p.field("at"), "the %s at X %s, Y %s is outside the cell's boundary", what, d.fmtLen(f.At.X), d.fmtLen(f.At.Y))
				okAt = false
			}
			good = good && okAt
		} else {
			good = false
		}
		if n := p.get("channel"); n != nil {
			var okCh bool
			if f.Channel, okCh = d.integer(n, p.field("channel"), "a channel number, a whole number from 1", 1); okCh {
				if first, dup := channels[f.Channel]; dup {
					d.errorf(ErrDuplicateName, n.Line, p.field("channel"), "channel %d is already used at line %d", f.Channel, first)
					okCh = false
				}
				channels[f.Channel] = n.Line
			}
			good = good && okCh
		}
		ok = ok && good
		a.Fixed = append(a.Fixed, f)
	}
	return ok
}
