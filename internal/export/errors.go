package export

import (
	"errors"
	"fmt"

	"arcwright/internal/planner"
)

// Sentinel errors. Every error this package returns for a bad plan wraps
// one of them, so callers can test with errors.Is.
var (
	// ErrNoPlan: the plan, or its request, is nil.
	ErrNoPlan = errors.New("export: no plan")
	// ErrInvalidPlan: the plan holds a value no output can represent (an
	// unknown polar-angle convention or verdict, a governing index outside
	// the operating points).
	ErrInvalidPlan = errors.New("export: invalid plan")
	// ErrNotFinite: a coordinate GeoJSON must write is NaN or ±Inf.
	ErrNotFinite = errors.New("export: not a finite number")
	// ErrNoPath: WriteFile was given an empty file name.
	ErrNoPath = errors.New("export: no file name")
	// ErrSamePath: an output's destination is an input of the run or the
	// destination of another output.
	ErrSamePath = errors.New("export: an output would overwrite another file of the run")
	// ErrNotRegular: a destination is a directory, a device or a socket.
	ErrNotRegular = errors.New("export: not a file that can be written")
	// ErrNoReader: a destination is a pipe that no process reads; writing
	// it would wait forever.
	ErrNoReader = errors.New("export: a pipe with no reader")
)

// checkPlan returns an error unless p can be written: p and its request are
// set, the convention is known, Governing indexes Points (when there are
// points), and every station's status and check verdicts are known.
func checkPlan(p *planner.Plan) error {
	if p == nil {
		return ErrNoPlan
	}
	if p.Request == nil {
		return fmt.Errorf("%w: the plan has no request", ErrNoPlan)
	}
	if _, ok := conventionName(p.Request.Convention); !ok {
		return fmt.Errorf("%w: polar-angle convention %d is neither from the jet axis nor from the inlet",
			ErrInvalidPlan, int(p.Request.Convention))
	}
	if len(p.Points) > 0 && (p.Governing < 0 || p.Governing >= len(p.Points)) {
		return fmt.Errorf("%w: governing point index %d outside the %d operating points",
			ErrInvalidPlan, p.Governing, len(p.Points))
	}
	for i := range p.Stations {
		s := &p.Stations[i]
		if _, ok := verdictName(s.Status); !ok {
			return fmt.Errorf("%w: station %q: status %d is not ok, warn or blocked",
				ErrInvalidPlan, s.ID, int(s.Status))
		}
		for _, c := range s.Checks {
			if _, ok := verdictName(c.Verdict); !ok {
				return fmt.Errorf("%w: station %q: check %q: verdict %d is not ok, warn or blocked",
					ErrInvalidPlan, s.ID, c.Name, int(c.Verdict))
			}
		}
	}
	return nil
}
