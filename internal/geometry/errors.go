package geometry

import (
	"errors"
	"fmt"
	"math"

	"github.com/paulmach/orb"
)

// Sentinel errors. Every error this package returns wraps one of them, so
// callers can test with errors.Is.
var (
	// ErrNotFinite: an input is NaN or ±Inf where a finite number is needed.
	ErrNotFinite = errors.New("geometry: not a finite number")
	// ErrOutOfRange: a finite input is outside its allowed range
	// (a negative radius, an inverted height range, …).
	ErrOutOfRange = errors.New("geometry: out of range")
	// ErrTooFewVertices: a ring has fewer than 3 distinct vertices.
	ErrTooFewVertices = errors.New("geometry: too few vertices")
	// ErrNotClosed: a ring's last vertex differs from its first.
	ErrNotClosed = errors.New("geometry: not closed")
	// ErrZeroLengthEdge: two consecutive vertices of a ring coincide
	// (other than the closing repeat).
	ErrZeroLengthEdge = errors.New("geometry: zero-length edge")
	// ErrZeroArea: a ring encloses no area (all its vertices are collinear).
	ErrZeroArea = errors.New("geometry: zero area")
	// ErrSelfIntersecting: two edges of a ring cross or touch.
	ErrSelfIntersecting = errors.New("geometry: self-intersecting")
	// ErrDuplicateName: two items of the same list share a name.
	ErrDuplicateName = errors.New("geometry: duplicate name")
	// ErrUnknownName: a name does not match any kind or surface.
	ErrUnknownName = errors.New("geometry: unknown name")
)

// InputError reports which input of a larger value is unusable. Field is the
// Go path of the input inside the value checked, such as "Boundary",
// "Obstacles[2].ZMax" or "Collector.Diameter" (indices 0-based, as in Go),
// so that a decoder can map it back to its own field names and line numbers.
// Err says why and wraps one of the sentinel errors.
type InputError struct {
	Field string
	Err   error
}

// Error returns the field path followed by the reason.
func (e *InputError) Error() string { return e.Field + ": " + e.Err.Error() }

// Unwrap returns the reason.
func (e *InputError) Unwrap() error { return e.Err }

// checkFinite returns an *InputError wrapping ErrNotFinite when v is NaN or ±Inf.
func checkFinite(field string, v float64) error {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return &InputError{Field: field, Err: fmt.Errorf("%w: got %g", ErrNotFinite, v)}
	}
	return nil
}

// checkNonNegative returns an error when v is not finite or is negative.
func checkNonNegative(field string, v float64, unit string) error {
	if err := checkFinite(field, v); err != nil {
		return err
	}
	if v < 0 {
		return &InputError{Field: field, Err: fmt.Errorf("%w: must not be negative, got %g %s", ErrOutOfRange, v, unit)}
	}
	return nil
}

// MaxCoord is the largest coordinate magnitude, m, that validation accepts
// for a plan position. 100 km is far beyond any test site, and keeps the
// rounding error of coordinates (about 1.5e-11 m at 100 km) well below
// [BoundaryTol] and squared distances far from overflow.
const MaxCoord = 1e5

// checkCoord returns an error when v is not finite or |v| > MaxCoord.
func checkCoord(field string, v float64) error {
	if err := checkFinite(field, v); err != nil {
		return err
	}
	if math.Abs(v) > MaxCoord {
		return &InputError{Field: field, Err: fmt.Errorf("%w: |%g m| exceeds %g m", ErrOutOfRange, v, float64(MaxCoord))}
	}
	return nil
}

// checkPoint returns an error when a coordinate of p is not finite or
// exceeds MaxCoord in magnitude.
func checkPoint(field string, p orb.Point) error {
	if err := checkCoord(field+".X", p[0]); err != nil {
		return err
	}
	return checkCoord(field+".Y", p[1])
}

// finite reports whether v is neither NaN nor ±Inf.
func finite(v float64) bool { return !math.IsNaN(v) && !math.IsInf(v, 0) }

// isNaNPoint reports whether either coordinate of p is NaN.
func isNaNPoint(p orb.Point) bool { return math.IsNaN(p[0]) || math.IsNaN(p[1]) }
