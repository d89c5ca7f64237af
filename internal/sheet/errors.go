package sheet

import "errors"

// Sentinel errors. Every error that Build, Render and Write return wraps one
// of them, so callers can test with errors.Is.
var (
	// ErrUnknownPaper: the paper named in the options or the plan is not
	// one of A4, A3, Letter and Tabloid.
	ErrUnknownPaper = errors.New("sheet: unknown paper")
	// ErrScale: the scale asked for is not usable (not positive, or the
	// plan does not fit the drawing area at it), or no standard scale fits.
	ErrScale = errors.New("sheet: scale does not fit")
	// ErrPaperRoom: sheet 1 of the paper has no room beside the plan for
	// the safety panel and every safety warning in legible type.
	ErrPaperRoom = errors.New("sheet: no room for the safety warnings")
	// ErrInvalidPlan: the plan is missing a part the sheet needs or holds a
	// NaN or infinite value where a number is printed or drawn.
	ErrInvalidPlan = errors.New("sheet: invalid plan")
	// ErrRender: the PDF writer failed.
	ErrRender = errors.New("sheet: cannot write the PDF")
)
