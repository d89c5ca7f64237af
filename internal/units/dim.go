package units

import "fmt"

// Dim is the physical dimension of a quantity.
//
// The zero value is not a dimension; passing it to [Parse] panics.
type Dim int

// The dimensions. Each comment names the SI unit a parsed value is returned in.
const (
	Length      Dim = iota + 1 // metres
	Temperature                // kelvin (absolute)
	Pressure                   // pascals
	Velocity                   // metres per second
	Angle                      // radians
	Frequency                  // hertz
	Fraction                   // dimensionless ratio, 0.6 for "60 %"

	// Mass and Time exist only so that a wrong unit can be named in an error
	// ("kg is a mass unit"); Parse does not read quantities of these dimensions.
	Mass // kilograms
	Time // seconds
)

var dimNames = [...]string{
	Length:      "length",
	Temperature: "temperature",
	Pressure:    "pressure",
	Velocity:    "velocity",
	Angle:       "angle",
	Frequency:   "frequency",
	Fraction:    "fraction",
	Mass:        "mass",
	Time:        "time",
}

// String returns the lower-case name of the dimension ("length",
// "temperature", ...), as used in messages such as "want a length".
// An out-of-range value prints as "Dim(n)".
func (d Dim) String() string {
	if d > 0 && int(d) < len(dimNames) {
		return dimNames[d]
	}
	return fmt.Sprintf("Dim(%d)", int(d))
}

// parseable reports whether Parse reads quantities of dimension d.
func (d Dim) parseable() bool {
	return d >= Length && d <= Fraction
}

// withArticle returns the dimension's name preceded by "a" or "an".
func (d Dim) withArticle() string {
	return article(d.String())
}

// article prefixes word with "a" or "an" by its first letter.
func article(word string) string {
	if word != "" {
		switch word[0] {
		case 'a', 'e', 'i', 'o', 'u':
			return "an " + word
		}
	}
	return "a " + word
}
