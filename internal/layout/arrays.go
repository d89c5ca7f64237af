package layout

import (
	"fmt"
	"sort"

	"arcwright/internal/planner"
)

// DefaultBaseHeight is the height of a stand's base above the floor when
// none is given, m (0.1 m, a typical tripod hub; common practice).
const DefaultBaseHeight = 0.1

// MaxStations is the largest number of stations one array may ask for. It
// is a guard of ours against a slip such as a spacing of 1 mm where 1 m was
// meant, well above any microphone count a test uses.
const MaxStations = 1000

var (
	standKeys   = []string{"name", "base_radius", "base_height", "pole_diameter", "boom_length", "microphone"}
	arrayKeys   = []string{"name", "stand", "first_channel", "aim", "microphone", "arc", "line", "near_field", "ring", "points", "probes"}
	patternKeys = []string{"arc", "line", "near_field", "ring", "points", "probes"}
	aimNames    = []string{"normal", "grazing"}
)

// standsSection decodes the stand types. names receives every stand name
// read, valid or not, so that references to a broken stand are not
// reported again as unresolved.
func (d *decoder) standsSection(top *section, ci *cellInfo, names *nameSet) []planner.Stand {
	field := top.field("stands")
	items, _ := d.list(top.get("stands"), field, top.keyLine("stands"), "a list of stand types")
	var out []planner.Stand
	for i, it := range items {
		s := d.section(it, index(field, i), it.Line, standKeys)
		st := planner.Stand{BaseHeight: DefaultBaseHeight}
		var ok bool
		st.Name, ok = d.name(s, "stand", names)
		if n := s.need("base_radius", "the radius of the base footprint, a length such as 0.35 m"); n != nil {
			var good bool
			st.BaseRadius, good = d.positiveLength(n, s.field("base_radius"), "the base radius")
			ok = ok && good
		} else {
			ok = false
		}
		if n := s.need("pole_diameter", "the diameter of the pole, a length such as 25 mm"); n != nil {
			var good bool
			st.PoleDiameter, good = d.positiveLength(n, s.field("pole_diameter"), "the pole diameter")
			ok = ok && good
		} else {
			ok = false
		}
		if n := s.get("base_height"); n != nil {
			var good bool
			if st.BaseHeight, good = d.nonNegativeLength(n, s.field("base_height"), "the base height"); good {
				good = d.heightRange(ci, st.BaseHeight, n.Line, s.field("base_height"), "the base")
			}
			ok = ok && good
		}
		if n := s.get("boom_length"); n != nil {
			var good bool
			st.BoomLength, good = d.nonNegativeLength(n, s.field("boom_length"), "the boom length")
			ok = ok && good
		}
		if n := s.get("microphone"); n != nil {
			var good bool
			st.Microphone, good = d.microphone(n, s.field("microphone"))
			ok = ok && good
		}
		if ok {
			out = append(out, st)
		}
	}
	return out
}

// arrayContext is what every array decoder needs.
type arrayContext struct {
	ci       *cellInfo
	stands   *nameSet // every stand name read
	stations *nameSet // names of points and probes, across arrays
}

// arraysSection decodes the arrays of stations.
func (d *decoder) arraysSection(top *section, ac *arrayContext) []planner.Array {
	field := top.field("arrays")
	if !top.has("arrays") {
		d.warnf(top.line, field, "no arrays: there are no stations to plan")
		return nil
	}
	items, ok := d.list(top.get("arrays"), field, top.keyLine("arrays"), "a list of arrays")
	if ok && len(items) == 0 {
		d.warnf(top.keyLine("arrays"), field, "no arrays: there are no stations to plan")
	}
	names := d.nameSet()
	var out []planner.Array
	for i, it := range items {
		s := d.section(it, index(field, i), it.Line, arrayKeys)
		if a, ok := d.array(s, ac, names); ok {
			out = append(out, a)
		}
	}
	return out
}

// array decodes one array: its name, stand, channels, aim and its one
// pattern.
func (d *decoder) array(s *section, ac *arrayContext, names *nameSet) (planner.Array, bool) {
	a := planner.Array{Line: s.line, Incidence: planner.NormalIncidence}
	var ok bool
	a.Name, ok = d.name(s, "array", names)
	if n := s.get("stand"); n != nil {
		if name, good := d.text(n, s.field("stand")); good {
			a.Stand = name
			if !ac.stands.has(name) {
				d.add(ErrUnresolved, nil, n.Line, s.field("stand"), unresolvedStand(name, ac.stands.list()))
				good = false
			}
			ok = ok && good
		} else {
			ok = false
		}
	}
	if n := s.get("first_channel"); n != nil {
		var good bool
		a.FirstChannel, good = d.integer(n, s.field("first_channel"), "a channel number, a whole number from 1", 1)
		ok = ok && good
	}
	if n := s.get("aim"); n != nil {
		if aim, good := d.choice(n, s.field("aim"), aimNames); good {
			if aim == "grazing" {
				a.Incidence = planner.GrazingIncidence
			}
		} else {
			ok = false
		}
	}
	if n := s.get("microphone"); n != nil {
		var good bool
		a.Microphone, good = d.microphone(n, s.field("microphone"))
		ok = ok && good
	}
	var given []string
	for _, k := range patternKeys {
		if s.has(k) {
			given = append(given, k)
		}
	}
	switch {
	case len(given) > 1:
		d.errorf(ErrInvalid, s.keyLine(given[1]), s.field(given[1]), "an array has one pattern; this one also has %s (make a second array)", given[0])
		return a, false
	case len(given) == 0:
		if s.isMap {
			d.errorf(ErrMissing, s.line, s.path, "missing a pattern; want one of %s", oneOf(patternKeys))
		}
		return a, false
	}
	var good bool
	switch key := given[0]; key {
	case "arc":
		good = d.arc(s, &a, ac)
	case "line":
		good = d.line(s, &a, ac)
	case "near_field":
		good = d.nearField(s, &a)
	case "ring":
		good = d.ring3(s, &a)
	case "points", "probes":
		good = d.fixed(s, key, &a, ac)
	}
	if good && a.Stand == "" && offFloor(&a) {
		d.warnf(s.line, s.path, "no stand, so the microphones are flush on the floor, but the stations are not at floor level; name a stand, or put the stations at height 0")
	}
	return a, ok && good
}

// offFloor reports whether some station of a is certainly above the floor.
func offFloor(a *planner.Array) bool {
	switch a.Kind {
	case planner.Arc, planner.Line:
		return !a.HasHeight || a.Height != 0
	case planner.Points, planner.Probes:
		for _, f := range a.Fixed {
			if f.At.Z != 0 {
				return true
			}
		}
		return false
	}
	return true
}

// unresolvedStand is the message for a stand name that no stand has.
func unresolvedStand(name string, known []string) string {
	if len(known) == 0 {
		return fmt.Sprintf("no stand named %q: the layout has no stands (add one under stands, or leave stand out for microphones flush on the floor)", name)
	}
	sort.Strings(known)
	if s := suggest(name, known); s != "" {
		return fmt.Sprintf("no stand named %q; did you mean %q?", name, s)
	}
	return fmt.Sprintf("no stand named %q; the stands are %s", name, oneOf(known))
}

// countCheck reports an array that asks for more than MaxStations stations.
func (d *decoder) countCheck(s *section, n float64) bool {
	if n > MaxStations {
		d.errorf(ErrInvalid, s.line, s.path, "asks for %.0f stations, more than %d; check the step or spacing", n, MaxStations)
		return false
	}
	return true
}
