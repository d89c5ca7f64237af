package units

import (
	"errors"
	"fmt"
	"strings"
)

// Error is returned by Parse for every input it cannot read. Its message quotes
// the whole input and says what was wanted and why the input does not fit:
//
//	want a length, got "5 kg" (kg is a mass unit)
//	want a temperature, got "15 Q" (unknown unit "Q"; known: K, C, F, R)
//	want a length, got "" (empty)
//	want a length, got "12 ft 6" (a number after feet needs a unit: "12 ft 6 in")
//	want a length, got "NaN mm" (not a finite number)
//
// A caller that knows the file and line adds them in front by wrapping the
// *Error with %w; errors.As recovers it.
type Error struct {
	Input  string // the whole input, as given to Parse
	Want   Dim    // the dimension that was wanted
	Reason string // what is wrong, in words; names the offending part
}

// Error returns the message described on [Error].
func (e *Error) Error() string {
	msg := fmt.Sprintf("want %s, got %q", e.Want.withArticle(), e.Input)
	if e.Reason != "" {
		msg += " (" + e.Reason + ")"
	}
	return msg
}

// ErrUnknownSystem is wrapped by ParseSystem for a name that is not a system.
var ErrUnknownSystem = errors.New("units: unknown unit system")

// reasons used in more than one place.
const (
	reasonEmpty     = "empty"
	reasonNotFinite = "not a finite number"
	reasonRange     = "out of range"
	reasonBelowZero = "below absolute zero"
)

// unknownUnitReason says that sym is no unit at all and lists the main
// symbols of want.
func unknownUnitReason(sym string, want Dim) string {
	return fmt.Sprintf("unknown unit %q; known: %s", sym, strings.Join(Symbols(want), ", "))
}

// wrongDimReason says that u measures another dimension than the one wanted.
func wrongDimReason(u Unit) string {
	return fmt.Sprintf("%s is %s unit", u.Symbol, article(u.Dim.String()))
}
