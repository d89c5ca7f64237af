package layout

import (
	"github.com/paulmach/orb"
	"math"
	"slices"
	"strings"

	"go.yaml.in/yaml/v3"

	"arcwright/internal/acoustics"
	"arcwright/internal/geometry"
	"arcwright/internal/planner"
	"arcwright/internal/units"
)

var (
	noiseKeys      = []string{"room_absorption", "reverberation_time", "contours"}
	crewKeys       = []string{"name", "at", "height", "hours"}
	microphoneKeys = []string{"size", "max_level", "upper_frequency"}
)

// Plausible ranges of the noise keys (a guard of ours against slips).
const (
	minLevel, maxLevel = 40.0, 200.0 // dB
	maxReverberation   = 30.0        // s
	// DefaultCrewHours is the exposure time of a crew position that gives
	// none: a full 8-hour shift, the reference of both the EU and the
	// NIOSH limits (conservative).
	DefaultCrewHours = 8.0
	// MinCrewHours is the shortest daily time at a crew position, h: 1 s.
	// A shorter time is a slip (1e-300 h), and the exposure of a second at
	// any level a jet makes is below every action value.
	MinCrewHours = 1.0 / 3600
	// ContourResolution is how close two contour levels may be and still
	// count as the same, dB: 0.1 dB, the sheet prints levels to 1 dB and
	// a prediction is good to a few dB.
	ContourResolution = 0.1
)

// noiseSection decodes noise: the room's absorption and extra contours.
func (d *decoder) noiseSection(top *section, ci *cellInfo) planner.Noise {
	s := top.sub("noise", noiseKeys)
	var n planner.Noise
	a, t := s.get("room_absorption"), s.get("reverberation_time")
	if a != nil && t != nil {
		d.errorf(ErrInvalid, s.keyLine("reverberation_time"), s.field("reverberation_time"), "give room_absorption or reverberation_time, not both")
	}
	if a != nil {
		if v, ok := d.number(a, s.field("room_absorption"), "an average absorption coefficient between 0 and 1, such as 0.05"); ok {
			if !(v >= planner.MinRoomAbsorption && v <= planner.MaxRoomAbsorption) {
				d.errorf(ErrInvalid, a.Line, s.field("room_absorption"), "want an average absorption coefficient from %g to %g, got %g (bare concrete is about 0.02, a fully treated room above 0.9)", planner.MinRoomAbsorption, planner.MaxRoomAbsorption, v)
			} else {
				n.RoomAbsorption = v
			}
		}
	}
	if t != nil {
		if v, ok := d.seconds(t, s.field("reverberation_time")); ok {
			vol, surf, room := planner.RoomSize(&ci.cell)
			alpha := 0.0
			if room {
				alpha = acoustics.EyringAbsorption(vol, surf, v)
			}
			switch {
			case v <= 0 || v > maxReverberation:
				d.errorf(ErrInvalid, t.Line, s.field("reverberation_time"), "want a reverberation time above 0 s and at most %g s, got %g s", maxReverberation, v)
			case room && !(alpha >= planner.MinRoomAbsorption && alpha <= planner.MaxRoomAbsorption):
				d.errorf(ErrInvalid, t.Line, s.field("reverberation_time"), "the reverberation time %g s gives an average absorption coefficient of %.2g (Eyring) in this room; %s (ᾱ from %g to %g)", v, alpha, planner.ReverberationRange(vol, surf), planner.MinRoomAbsorption, planner.MaxRoomAbsorption)
			default:
				n.Reverberation = v
			}
		}
	}
	if (a != nil || t != nil) && ci.cell.Kind != geometry.HardWalled {
		d.warnf(s.line, s.field("room_absorption"), "the room's absorption is used only for a hard-walled cell; this cell is %s", ci.cell.Kind)
	}
	items, _ := d.list(s.get("contours"), s.field("contours"), s.keyLine("contours"), "a list of A-weighted levels, such as [80 dB(A), 95 dB(A)]")
	for i, it := range items {
		field := index(s.field("contours"), i)
		v, ok := d.level(it, field, aWeighted)
		switch {
		case !ok:
		case sameLevel(v, planner.ContourA):
			d.errorf(ErrInvalid, it.Line, field, "%g dB(A) is always drawn (%g dB(A)): remove it from the list", v, planner.ContourA)
		case slices.ContainsFunc(n.Contours, func(c float64) bool { return sameLevel(c, v) }):
			d.errorf(ErrInvalid, it.Line, field, "%g dB(A) is already in the list: give each contour once", v)
		default:
			n.Contours = append(n.Contours, v)
		}
	}
	return n
}

// sameLevel reports whether contour levels a and b, dB, are the same to
// ContourResolution (they round alike at 0.1 dB, or are closer than half
// of it).
func sameLevel(a, b float64) bool { return math.Abs(a-b) < ContourResolution/2+1e-9 }

// crewSection decodes crew: where people stay during runs.
func (d *decoder) crewSection(top *section, ci *cellInfo) []planner.Crew {
	field := top.field("crew")
	items, _ := d.list(top.get("crew"), field, top.keyLine("crew"), "a list of crew positions")
	names := d.nameSet()
	var out []planner.Crew
	for i, it := range items {
		s := d.section(it, index(field, i), it.Line, crewKeys)
		c := planner.Crew{Line: it.Line, Hours: DefaultCrewHours}
		var ok bool
		c.Name, ok = d.name(s, "crew position", names)
		c.At.Z = planner.DefaultEarHeight
		if n := s.need("at", "the position in plan, [x, y]"); n != nil {
			p, good := d.planPoint(n, s.field("at"), s.keyLine("at"))
			c.At.X, c.At.Y = p[0], p[1]
			ok = ok && good
		} else {
			ok = false
		}
		if n := s.get("height"); n != nil {
			h, good := d.nonNegativeLength(n, s.field("height"), "the ear height")
			if good {
				good = d.heightRange(ci, h, n.Line, s.field("height"), "the ear height")
			}
			c.At.Z = h
			ok = ok && good
		}
		if n := s.get("at"); n != nil && ok {
			for _, o := range ci.cell.Obstacles {
				if o.Footprint.Contains(orb.Point{c.At.X, c.At.Y}) && o.ZMin < c.At.Z {
					d.warnf(n.Line, s.field("at"), "crew position %s is inside the obstacle %s: no one can stand there; check its position", c.Name, o.Name)
				}
			}
		}
		if n := s.get("hours"); n != nil {
			h, good := d.hours(n, s.field("hours"))
			c.Hours = h
			ok = ok && good
		}
		if ok {
			out = append(out, c)
		}
	}
	return out
}

// microphone decodes an array's or stand's microphone: a nominal size
// ("1/4 in") whose typical limits apply, or a map with size, max_level and
// upper_frequency.
func (d *decoder) microphone(n *yaml.Node, field string) (*acoustics.Microphone, bool) {
	sizes := func() string {
		var names []string
		for _, c := range acoustics.MicrophoneClasses() {
			names = append(names, c.Name)
		}
		return strings.Join(names, ", ")
	}
	if n.Kind == yaml.ScalarNode {
		v, ok := d.text(n, field)
		if !ok {
			return nil, false
		}
		c, found := acoustics.MicrophoneClassNamed(v)
		if !found {
			d.errorf(ErrInvalid, n.Line, field, "want a nominal size (%s) or a map with size, max_level and upper_frequency, got %q", sizes(), v)
			return nil, false
		}
		m := c.Typical()
		return &m, true
	}
	s := d.section(n, field, n.Line, microphoneKeys)
	m := &acoustics.Microphone{}
	ok := true
	if v := s.get("size"); v != nil {
		name, good := d.text(v, s.field("size"))
		m.Name = name
		if c, found := acoustics.MicrophoneClassNamed(name); good && found {
			*m = c.Typical()
		}
		ok = ok && good
	}
	if v := s.get("max_level"); v != nil {
		l, good := d.level(v, s.field("max_level"), unweighted)
		m.MaxLevel = l
		ok = ok && good
	}
	if v := s.get("upper_frequency"); v != nil {
		f, good := d.quantity(v, s.field("upper_frequency"), units.Frequency, "Hz")
		if good && !(f > 0) {
			d.errorf(ErrInvalid, v.Line, s.field("upper_frequency"), "want a frequency above 0 Hz, got %s", units.FormatFrequency(f))
			good = false
		}
		m.UpperFrequency = f
		ok = ok && good
	}
	if ok && (m.MaxLevel == 0 || m.UpperFrequency == 0) {
		d.errorf(ErrMissing, n.Line, field, "give a nominal size (%s) or both max_level and upper_frequency", sizes())
		ok = false
	}
	if m.Name == "" {
		m.Name = "named"
	}
	return m, ok
}

// weighting is the frequency weighting a level key takes.
type weighting int

const (
	// aWeighted: a number, or a number followed by dB(A) or dBA.
	aWeighted weighting = iota
	// unweighted: a number, or a number followed by dB (dB re 20 µPa).
	unweighted
)

// levelUnits are the unit suffixes of a level, longest first, with their
// weighting: 'A', 'C' or 0 (unweighted).
var levelUnits = []struct {
	suffix string
	w      byte
}{{"dB(A)", 'A'}, {"dB(C)", 'C'}, {"dBA", 'A'}, {"dBC", 'C'}, {"dB", 0}}

// level reads a level in dB with weighting w: a number, or a number
// followed by the unit of w. A level in another weighting is an error: a
// C-weighted contour is not drawn as dB(A), and a microphone's limit is
// unweighted.
func (d *decoder) level(n *yaml.Node, field string, w weighting) (float64, bool) {
	example := "85 dB(A)"
	if w == unweighted {
		example = "146 dB"
	}
	s, ok := d.scalar(n, field, "a level in dB, such as "+example)
	if !ok {
		return 0, false
	}
	t := strings.TrimSpace(s)
	for _, u := range levelUnits {
		if !strings.HasSuffix(t, u.suffix) {
			continue
		}
		switch {
		case w == aWeighted && u.w != 'A':
			d.errorf(ErrInvalid, n.Line, field, "contours are A-weighted levels, got %q: write a level in dB(A), such as 95 dB(A) (the 140 dB(C) peak contour is always drawn)", s)
			return 0, false
		case w == unweighted && u.w != 0:
			d.errorf(ErrInvalid, n.Line, field, "a microphone's upper limit is an unweighted level (dB re 20 µPa), got %q: write it in dB, such as 146 dB", s)
			return 0, false
		}
		t = strings.TrimSpace(strings.TrimSuffix(t, u.suffix))
		break
	}
	v, err := ParseDecimal(t)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		d.errorf(ErrInvalid, n.Line, field, "want a level in dB, such as %s, got %q", example, s)
		return 0, false
	}
	if v < minLevel || v > maxLevel {
		d.errorf(ErrInvalid, n.Line, field, "the level %g dB is implausible; want %g–%g dB", v, minLevel, maxLevel)
		return v, false
	}
	return v, true
}

// seconds reads a time in s: a number, or a number followed by s or ms.
func (d *decoder) seconds(n *yaml.Node, field string) (float64, bool) {
	return d.duration(n, field, "a time in seconds, such as 1.8 s", map[string]float64{"ms": 1e-3, "s": 1}, 1)
}

// hours reads a daily exposure time in h: a number (hours), or a number
// followed by h or min; above 0 and at most 24 h.
func (d *decoder) hours(n *yaml.Node, field string) (float64, bool) {
	h, ok := d.duration(n, field, "hours per day, such as 2 h or 30 min", map[string]float64{"min": 1.0 / 60, "h": 1}, 1)
	if ok && !inside(h, MinCrewHours, 24) {
		d.errorf(ErrInvalid, n.Line, field, "want a time of at least 1 s and at most 24 h per day, got %g h", h)
		return h, false
	}
	return h, ok
}

// duration reads a number with one of the unit suffixes in scale (a bare
// number is multiplied by bare).
func (d *decoder) duration(n *yaml.Node, field, want string, scale map[string]float64, bare float64) (float64, bool) {
	s, ok := d.scalar(n, field, want)
	if !ok {
		return 0, false
	}
	t := strings.TrimSpace(s)
	f := bare
	for _, suf := range []string{"min", "ms", "h", "s"} { // longest first where they share a letter
		if k, found := scale[suf]; found && strings.HasSuffix(t, suf) {
			t, f = strings.TrimSpace(strings.TrimSuffix(t, suf)), k
			break
		}
	}
	v, err := ParseDecimal(t)
	if err != nil || math.IsNaN(v) || math.IsInf(v, 0) {
		d.errorf(ErrInvalid, n.Line, field, "want %s, got %q", want, s)
		return 0, false
	}
	return v * f, true
}
