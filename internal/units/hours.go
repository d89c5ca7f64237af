package units

import (
	"fmt"
	"math"
)

// FormatHours prints a time given in hours the way an exposure table
// reads: "> 24 h" from a day on, hours to three figures down to one hour,
// then minutes, then seconds. A value that is not finite prints "-".
func FormatHours(h float64) string {
	switch {
	case math.IsNaN(h) || math.IsInf(h, 0):
		return "-"
	case h >= 24:
		return "> 24 h"
	case h >= 1:
		return fmt.Sprintf("%.3g h", h)
	case h*60 >= 1:
		return fmt.Sprintf("%.3g min", h*60)
	}
	return fmt.Sprintf("%.2g s", h*3600)
}
