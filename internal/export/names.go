package export

import (
	"strconv"

	"arcwright/internal/planner"
)

// The polar-angle convention names written to every output.
const (
	conventionJetAxis = "from_jet_axis"
	conventionInlet   = "from_inlet"
)

// conventionName returns "from_jet_axis" or "from_inlet", and false for an
// unknown convention.
func conventionName(c planner.Convention) (string, bool) {
	switch c {
	case planner.FromJetAxis:
		return conventionJetAxis, true
	case planner.FromInlet:
		return conventionInlet, true
	}
	return "", false
}

// verdictName returns "ok", "warn" or "blocked", and false for an unknown
// verdict (including the zero value).
func verdictName(v planner.Verdict) (string, bool) {
	switch v {
	case planner.OK, planner.Warn, planner.Blocked:
		return v.String(), true
	}
	return "", false
}

// kindName returns the machine name of an array kind: arc, line,
// near_field, ring, points or probes; "kind_N" for an unknown kind.
func kindName(k planner.ArrayKind) string {
	switch k {
	case planner.Arc:
		return "arc"
	case planner.Line:
		return "line"
	case planner.NearField:
		return "near_field"
	case planner.Ring:
		return "ring"
	case planner.Points:
		return "points"
	case planner.Probes:
		return "probes"
	}
	return "kind_" + strconv.Itoa(int(k))
}

// aimName returns "normal" or "grazing"; the zero Incidence is normal, as
// in [planner.Array].
func aimName(i planner.Incidence) string {
	if i == planner.GrazingIncidence {
		return "grazing"
	}
	return "normal"
}

// standName returns the stand type's name, and "" for a microphone flush on
// the floor (no stand).
func standName(s *planner.Station) string {
	if s.Stand == nil {
		return ""
	}
	return s.Stand.Name
}

// lengthChecks are the checks whose value is a length in metres, rounded
// like every length.
var lengthChecks = map[string]bool{
	planner.CheckVelocity: true,
	planner.CheckHot:      true,
	planner.CheckWall:     true,
	planner.CheckObstacle: true,
	planner.CheckKeepOut:  true,
	planner.CheckSpacing:  true,
	planner.CheckHeight:   true,
}

// checkValue returns the value of the check named name at s, NaN when s has
// no such check.
func checkValue(s *planner.Station, name string) float64 {
	c, ok := s.Check(name)
	if !ok {
		return nan
	}
	return c.Value
}

// checkNumber returns the value of check c rounded for its quantity:
// lengths to 0.1 mm, anything else to 6 significant digits.
func checkNumber(c planner.Check) num {
	if lengthChecks[c.Name] || c.Unit == "m" {
		return metres(c.Value)
	}
	return sig(c.Value)
}
