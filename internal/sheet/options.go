package sheet

import (
	"fmt"
	"strings"
	"time"

	"arcwright/internal/planner"
)

// Options are the caller's wishes for the sheet. The zero value takes the
// paper and scale from the plan's request and the issue date from the clock.
type Options struct {
	// Paper is "A4", "A3", "Letter" or "Tabloid" (case is ignored); ""
	// takes Plan.Request.Sheet.Paper, and A3 when that is empty too. The
	// sheet is always landscape.
	Paper string
	// Scale is the plan's scale denominator (50 means 1:50); 0 takes
	// Plan.Request.Sheet.Scale, and when that is 0 too the largest standard
	// scale that fits the drawing area. A scale asked for that does not fit
	// is an error naming the scale that would.
	Scale int
	// Now is the clock for the issue date when the title block has none;
	// nil means time.Now.
	Now func() time.Time
}

// Paper is a sheet size, landscape, in millimetres.
type Paper struct {
	Name          string
	Width, Height float64 // mm, Width > Height
}

// papers are the supported sizes, landscape. ISO 216 A4 and A3 (297 × 210
// and 420 × 297 mm) and ANSI/ASME Y14.1 A (Letter, 11 × 8.5 in) and B
// (Tabloid, 17 × 11 in) at 25.4 mm/in (acoustics.md §8.2: ISO sizes
// CONFIRMED, ANSI sizes FROM MEMORY).
var papers = []Paper{
	{Name: "A4", Width: 297, Height: 210},
	{Name: "A3", Width: 420, Height: 297},
	{Name: "Letter", Width: 279.4, Height: 215.9},
	{Name: "Tabloid", Width: 431.8, Height: 279.4},
}

// Papers returns the supported paper sizes, landscape.
func Papers() []Paper { return append([]Paper(nil), papers...) }

// lookupPaper returns the paper named s (case and surrounding space ignored).
func lookupPaper(s string) (Paper, bool) {
	s = strings.TrimSpace(s)
	for _, p := range papers {
		if strings.EqualFold(p.Name, s) {
			return p, true
		}
	}
	return Paper{}, false
}

// resolvePaper returns the paper the options and the plan ask for, and the
// name of the option that chose it (for messages).
func resolvePaper(opt Options, req *planner.Request) (Paper, error) {
	name, field := opt.Paper, "Options.Paper"
	if strings.TrimSpace(name) == "" {
		name, field = req.Sheet.Paper, "Request.Sheet.Paper"
	}
	if strings.TrimSpace(name) == "" {
		p, _ := lookupPaper("A3")
		return p, nil
	}
	p, ok := lookupPaper(name)
	if !ok {
		return Paper{}, fmt.Errorf("%w %q in %s (want A4, A3, Letter or Tabloid)", ErrUnknownPaper, name, field)
	}
	return p, nil
}

// resolveScale returns the scale denominator asked for (0: choose) and the
// name of the option that asked.
func resolveScale(opt Options, req *planner.Request) (int, string, error) {
	s, field := opt.Scale, "Options.Scale"
	if s == 0 {
		s, field = req.Sheet.Scale, "Request.Sheet.Scale"
	}
	if s < 0 {
		return 0, field, fmt.Errorf("%w: %s is 1:%d, want a positive denominator or 0 to choose", ErrScale, field, s)
	}
	return s, field, nil
}
