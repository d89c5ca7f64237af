package export

import (
	"encoding/csv"
	"fmt"
	"io"

	"arcwright/internal/planner"
)

// asBuiltColumns are the measured columns of the as-built form, as
// 'arcwright check --as-built' reads them.
var asBuiltColumns = []string{"id", "x", "y", "z", "base_x", "base_y"}

// AsBuiltTemplate writes the form for the positions measured after set-up:
// a header row naming only the measured columns (id, x, y, z, base_x,
// base_y), then one row per station of p in plan order with its ID and the
// measured cells empty. A technician fills in each station measured (bare
// numbers in the layout's length unit, or values with units); a row left
// empty is a station not measured, which 'arcwright check --as-built' lists
// as such instead of taking it as placed as planned. No planned value is
// written, so that an untouched row can never pass for a measurement.
//
// It returns an error wrapping [ErrNoPlan] when p or p.Request is nil,
// wrapping [ErrInvalidPlan] when p cannot be written, and the error of w.
func AsBuiltTemplate(w io.Writer, p *planner.Plan) error {
	if err := checkPlan(p); err != nil {
		return err
	}
	cw := csv.NewWriter(w)
	if err := cw.Write(asBuiltColumns); err != nil {
		return fmt.Errorf("export: writing the as-built form: %w", err)
	}
	row := make([]string, len(asBuiltColumns))
	for i := range p.Stations {
		row[0] = p.Stations[i].ID
		if err := cw.Write(row); err != nil {
			return fmt.Errorf("export: writing the as-built form for station %q: %w", row[0], err)
		}
	}
	cw.Flush()
	if err := cw.Error(); err != nil {
		return fmt.Errorf("export: writing the as-built form: %w", err)
	}
	return nil
}
