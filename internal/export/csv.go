package export

import (
	"encoding/csv"
	"fmt"
	"io"
	"strconv"
	"strings"

	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// csvColumns are the columns of the station table; a name ending in "_"
// is a length and takes the unit suffix of the plan's unit system ("m" or
// "ft").
var csvColumns = []string{
	"id", "channel", "array", "kind",
	"x_", "y_", "z_", "base_x_", "base_y_", "height_",
	"radius_", "nominal_radius_", "polar_deg", "nominal_polar_deg", "acoustic_distance_", "acoustic_polar_deg",
	"polar_convention", "azimuth_deg",
	"stand", "aim", "status", "governing_point",
	"velocity_clearance_", "velocity_point", "hot_clearance_", "hot_point", "wall_clearance_",
	"oaspl_db", "reasons",
}

// CSVHeader returns the header row of the station table in unit system
// sys: lengths in metres ("x_m") for a metric plan, in decimal feet
// ("x_ft") for an imperial one.
func CSVHeader(sys units.System) []string {
	suffix := "m"
	if sys == units.Imperial {
		suffix = "ft"
	}
	out := make([]string, len(csvColumns))
	for i, c := range csvColumns {
		if strings.HasSuffix(c, "_") {
			c += suffix
		}
		out[i] = c
	}
	return out
}

// checkPoint returns the operating point that governs the check named
// name of s, "" when it has none.
func checkPoint(s *planner.Station, name string) string {
	c, _ := s.Check(name)
	return c.Point
}

// reasonSeparator joins a station's reasons in one cell.
const reasonSeparator = "; "

// CSV writes the station table of p to w: a header row, then one row per
// station in plan order, with the columns
//
//	id, channel, array, kind, x_m, y_m, z_m, base_x_m, base_y_m, height_m,
//	radius_m, nominal_radius_m, polar_deg, nominal_polar_deg,
//	acoustic_distance_m, acoustic_polar_deg,
//	polar_convention, azimuth_deg, stand, aim, status, governing_point,
//	velocity_clearance_m, velocity_point, hot_clearance_m, hot_point,
//	wall_clearance_m, oaspl_db, reasons
//
// The lengths are in the plan's unit system, the same as its reasons: in
// metres with 4 decimals (columns ending in _m) for a metric plan, in
// decimal feet with 4 decimals (_ft) for an imperial one; angles are
// degrees with 2 decimals. x, y and z are the microphone (or probe tip) in
// the cell frame, whose z is measured up from the floor; height is the same
// number, the microphone's height above the floor, for data systems that
// ask for a height (an as-built file may give either); base_x and base_y
// are the stand pole in plan. nominal_radius_m and nominal_polar_deg are
// what the layout asks for, radius_m and polar_deg the same quantities as
// placed, so that a station placed where the layout asks has them equal: an
// arc's radius and angle in its own plane (in plan for an arc set out in
// plan), a ring's radius about the axis, a line's offset from the axis
// (its angle for a line stepped by angle), a near-field line's clearance
// from the predicted plume edge (radius_m and nominal_radius_m are empty for
// points and probes, which have no nominal; polar_deg is then the angle
// seen from the nozzle exit). acoustic_distance_m and acoustic_polar_deg are
// the microphone's true distance and angle in space from its array's centre
// on the axis (arcs, lines stepped by angle) or from the nozzle exit, which
// the checks use (a ring microphone 0.9 m from the axis may be 1.7 m from
// the exit); before these two columns were added, radius_m and polar_deg
// held them. Polar angles are in the layout's convention, which
// polar_convention names ("from_jet_axis" or "from_inlet"), and azimuth_deg
// is the jet-frame azimuth. velocity_point and hot_point name the operating
// point that governs each clearance; governing_point the one of the worst
// check. oaspl_db is the predicted OASPL at the microphone for the loudest
// operating point (dB, 2 decimals). A NaN or ±Inf value, or a check the
// station does not have, gives
// an empty cell. stand is empty for a microphone flush on the floor and
// channel is empty for a probe stand, which has none (0 is a real channel
// on many systems). Reasons are joined with "; ". Rows end in "\n"
// (encoding/csv quoting).
//
// It returns an error wrapping [ErrNoPlan] when p or p.Request is nil,
// wrapping [ErrInvalidPlan] when p cannot be written, and the error of w.
func CSV(w io.Writer, p *planner.Plan) error {
	if err := checkPlan(p); err != nil {
		return err
	}
	conv, _ := conventionName(p.Request.Convention)
	sys := p.Request.System()
	header := CSVHeader(sys)
	length := cellMetres
	if sys == units.Imperial {
		length = func(m float64) string { return cellMetres(m / units.Foot) }
	}
	cw := csv.NewWriter(w)
	if err := cw.Write(header); err != nil {
		return fmt.Errorf("export: writing CSV: %w", err)
	}
	row := make([]string, len(header))
	for i := range p.Stations {
		s := &p.Stations[i]
		status, _ := verdictName(s.Status)
		row = append(row[:0],
			s.ID, channel(s), s.Array, kindName(s.Kind),
			length(s.Mic.X), length(s.Mic.Y), length(s.Mic.Z),
			length(s.Base[0]), length(s.Base[1]), length(s.Height),
			length(p.PlacedRadius(s)), length(p.NominalRadius(s)), cellDegrees(p.PlacedPolar(s)), cellDegrees(s.Nominal),
			length(s.Radius), cellDegrees(s.Polar), conv, cellDegrees(s.Jet.Azimuth),
			standName(s), aimName(s.Incidence), status, s.Governing,
			length(checkValue(s, planner.CheckVelocity)), checkPoint(s, planner.CheckVelocity),
			length(checkValue(s, planner.CheckHot)), checkPoint(s, planner.CheckHot),
			length(checkValue(s, planner.CheckWall)),
			cellFixed(checkValue(s, planner.CheckLevel), levelDecimals),
			strings.Join(s.Reasons, reasonSeparator),
		)
		if err := cw.Write(row); err != nil {
			return fmt.Errorf("export: writing CSV row for station %q: %w", s.ID, err)
		}
	}
	cw.Flush()
	if err := cw.Error(); err != nil {
		return fmt.Errorf("export: writing CSV: %w", err)
	}
	return nil
}

// channel returns a station's data-system channel, and "" for a probe
// stand, which has none (0 is a real channel on many systems).
func channel(s *planner.Station) string {
	if s.Kind == planner.Probes {
		return ""
	}
	return strconv.Itoa(s.Channel)
}
