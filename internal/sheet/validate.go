package sheet

import (
	"fmt"

	"arcwright/internal/planner"
	"arcwright/internal/units"
)

// validate checks that p has every part the sheet reads and no NaN or
// infinite value where the sheet prints or draws a number. Check values may
// be NaN (a check that does not apply) or infinite (no wall): they print as
// "n/a" and "none". The error names the first bad input by its Go path.
func validate(p *planner.Plan) error {
	bad := func(format string, a ...any) error {
		return fmt.Errorf("%w: "+format, append([]any{ErrInvalidPlan}, a...)...)
	}
	if p == nil {
		return bad("the plan is nil")
	}
	r := p.Request
	if r == nil {
		return bad("Plan.Request is nil")
	}
	if r.Units != units.Metric && r.Units != units.Imperial {
		return bad("Request.Units is %v, want metric or imperial", r.Units)
	}
	if r.Convention != planner.FromInlet && r.Convention != planner.FromJetAxis {
		return bad("Request.Convention is %v, want from the inlet or from the jet axis", r.Convention)
	}
	if err := r.Cell.Validate(); err != nil {
		return fmt.Errorf("%w: Request.Cell.%w", ErrInvalidPlan, err)
	}
	if err := r.Exit.Validate(); err != nil {
		return fmt.Errorf("%w: Request.Exit.%w", ErrInvalidPlan, err)
	}
	for _, f := range []struct {
		name string
		v    float64
	}{
		{"Velocity", r.Limits.Velocity}, {"Temperature", r.Limits.Temperature}, {"Margin", r.Limits.Margin},
		{"WallClearance", r.Limits.WallClearance},
	} {
		if !finite(f.v) || f.v < 0 {
			return bad("Request.Limits.%s is %v, want a finite value >= 0 (0 for the default)", f.name, f.v)
		}
	}
	for _, f := range []struct {
		name string
		v    float64
	}{{"Pressure", r.Ambient.Pressure}, {"Temperature", r.Ambient.Temperature}, {"Humidity", r.Ambient.Humidity}} {
		if !finite(f.v) {
			return bad("Request.Ambient.%s is %v", f.name, f.v)
		}
	}
	if len(p.Points) == 0 {
		return bad("Plan.Points is empty: the sheet draws the zones of the governing point")
	}
	if p.Governing < 0 || p.Governing >= len(p.Points) {
		return bad("Plan.Governing is %d, want an index into Plan.Points (0 to %d)", p.Governing, len(p.Points)-1)
	}
	if p.GoverningHot < 0 || p.GoverningHot >= len(p.Points) {
		return bad("Plan.GoverningHot is %d, want an index into Plan.Points (0 to %d)", p.GoverningHot, len(p.Points)-1)
	}
	for i := range p.Points {
		if err := validatePoint(&p.Points[i], i); err != nil {
			return err
		}
	}
	for i, a := range p.Arrays {
		if !finite(a.Centre.X, a.Centre.Y, a.Centre.Z, a.Radius) {
			return bad("Arrays[%d] (%s): Centre or Radius is not finite", i, a.Name)
		}
	}
	for i := range p.Stations {
		if err := validateStation(&p.Stations[i], i); err != nil {
			return err
		}
	}
	for i, row := range p.Absorption {
		if !finite(row.PerM) {
			return bad("Absorption[%d] (%s).PerM is %v", i, row.Band.Nominal, row.PerM)
		}
		for j, v := range row.ArrayDB {
			if !finite(v) {
				return bad("Absorption[%d] (%s).ArrayDB[%d] is %v", i, row.Band.Nominal, j, v)
			}
		}
	}
	return nil
}

func validatePoint(pt *planner.PointResult, i int) error {
	if pt.Plume == nil {
		return fmt.Errorf("%w: Points[%d] (%s).Plume is nil", ErrInvalidPlan, i, pt.Name)
	}
	e := pt.Exit
	for _, f := range []struct {
		name string
		v    float64
	}{
		{"CoreNominal", pt.CoreNominal}, {"CoreConservative", pt.CoreConservative},
		{"Exit.Mach", e.Mach}, {"Exit.Velocity", e.Velocity}, {"Exit.StaticTemperature", e.StaticTemperature},
		{"Exit.TotalTemperature", e.TotalTemperature}, {"Exit.Diameter", e.Diameter},
		{"Exit.FullyExpandedDiameter", e.FullyExpandedDiameter}, {"Condition.Primary.NPR", pt.Condition.Primary.NPR},
		{"CaptureDiameter", pt.CaptureDiameter},
	} {
		if !finite(f.v) {
			return fmt.Errorf("%w: Points[%d] (%s).%s is %v", ErrInvalidPlan, i, pt.Name, f.name, f.v)
		}
	}
	return nil
}

func validateStation(s *planner.Station, i int) error {
	for _, f := range []struct {
		name string
		v    float64
	}{
		{"Mic.X", s.Mic.X}, {"Mic.Y", s.Mic.Y}, {"Mic.Z", s.Mic.Z}, {"Base.X", s.Base[0]}, {"Base.Y", s.Base[1]},
		{"Height", s.Height}, {"Radius", s.Radius}, {"Polar", s.Polar},
		{"AimAt.X", s.AimAt.X}, {"AimAt.Y", s.AimAt.Y}, {"AimAt.Z", s.AimAt.Z},
		{"Jet.X", s.Jet.X}, {"Jet.R", s.Jet.R},
	} {
		if !finite(f.v) {
			return fmt.Errorf("%w: Stations[%d] (%s).%s is %v", ErrInvalidPlan, i, s.ID, f.name, f.v)
		}
	}
	if s.Status != planner.OK && s.Status != planner.Warn && s.Status != planner.Blocked {
		return fmt.Errorf("%w: Stations[%d] (%s).Status is %v, want ok, warn or blocked", ErrInvalidPlan, i, s.ID, s.Status)
	}
	if st := s.Stand; st != nil {
		for _, f := range []struct {
			name string
			v    float64
		}{{"BaseRadius", st.BaseRadius}, {"BoomLength", st.BoomLength}, {"PoleDiameter", st.PoleDiameter}} {
			if !finite(f.v) || f.v < 0 {
				return fmt.Errorf("%w: Stations[%d] (%s).Stand.%s is %v, want a finite value >= 0", ErrInvalidPlan, i, s.ID, f.name, f.v)
			}
		}
	}
	return nil
}

// limits returns the request's limits with zero fields replaced by the
// planner's defaults, as the planner applies them.
func limits(l planner.Limits) planner.Limits {
	d := planner.DefaultLimits()
	pick := func(v, def float64) float64 {
		if v == 0 {
			return def
		}
		return v
	}
	l.Velocity = pick(l.Velocity, d.Velocity)
	l.Temperature = pick(l.Temperature, d.Temperature)
	l.Margin = pick(l.Margin, d.Margin)
	l.WallClearance = pick(l.WallClearance, d.WallClearance)
	return l
}
