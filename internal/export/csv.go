package export

import (
	"encoding/csv"
	"fmt"
	"io"
	"strconv"
	"strings"

	"arcwright/internal/planner"
)

// csvHeader is the header row of the station table.
var csvHeader = []string{
	"id", "channel", "array", "kind",
	"x_m", "y_m", "z_m", "base_x_m", "base_y_m", "height_m",
	"radius_m", "nominal_radius_m", "polar_deg", "nominal_polar_deg", "polar_convention", "azimuth_deg",
	"stand", "aim", "status", "governing_point",
	"velocity_clearance_m", "velocity_point", "hot_clearance_m", "hot_point", "wall_clearance_m",
	"oaspl_db", "reasons",
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
//	polar_convention, azimuth_deg, stand, aim, status, governing_point,
//	velocity_clearance_m, velocity_point, hot_clearance_m, hot_point,
//	wall_clearance_m, oaspl_db, reasons
//
// Lengths are metres with 4 decimals and angles degrees with 2. radius_m
// and polar_deg are as placed: the microphone's true distance and polar
// angle from its array's centre on the axis (arcs) or from the nozzle exit;
// nominal_radius_m and nominal_polar_deg are what the layout asks for (an
// arc's radius and angle in its own plane, a ring's radius; empty where the
// layout asks for none). Polar angles are in the layout's convention, which
// polar_convention names ("from_jet_axis" or "from_inlet"), and azimuth_deg
// is the jet-frame azimuth. velocity_point and hot_point name the operating
// point that governs each clearance; governing_point the one of the worst
// check. oaspl_db is the predicted OASPL at the microphone for the loudest
// operating point (dB, 2 decimals). A NaN or ±Inf value, or a check the
// station does not have, gives
// an empty cell. stand is empty for a microphone flush on the floor and
// channel is 0 for a probe stand. Reasons are joined with "; ". Rows end
// in "\n" (encoding/csv quoting).
//
// It returns an error wrapping [ErrNoPlan] when p or p.Request is nil,
// wrapping [ErrInvalidPlan] when p cannot be written, and the error of w.
func CSV(w io.Writer, p *planner.Plan) error {
	if err := checkPlan(p); err != nil {
		return err
	}
	conv, _ := conventionName(p.Request.Convention)
	cw := csv.NewWriter(w)
	if err := cw.Write(csvHeader); err != nil {
		return fmt.Errorf("export: writing CSV: %w", err)
	}
	row := make([]string, len(csvHeader))
	for i := range p.Stations {
		s := &p.Stations[i]
		status, _ := verdictName(s.Status)
		row = append(row[:0],
			s.ID, strconv.Itoa(s.Channel), s.Array, kindName(s.Kind),
			cellMetres(s.Mic.X), cellMetres(s.Mic.Y), cellMetres(s.Mic.Z),
			cellMetres(s.Base[0]), cellMetres(s.Base[1]), cellMetres(s.Height),
			cellMetres(s.Radius), cellMetres(p.NominalRadius(s)), cellDegrees(s.Polar), cellDegrees(s.Nominal),
			conv, cellDegrees(s.Jet.Azimuth),
			standName(s), aimName(s.Incidence), status, s.Governing,
			cellMetres(checkValue(s, planner.CheckVelocity)), checkPoint(s, planner.CheckVelocity),
			cellMetres(checkValue(s, planner.CheckHot)), checkPoint(s, planner.CheckHot),
			cellMetres(checkValue(s, planner.CheckWall)),
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
