package sheet

import "arcwright/internal/planner"

// textMeter measures the texts of the tests.
var textMeter = newMeter()

// TextWidth returns the printed width of t, mm (for the page-flow tests,
// which measure how full a sheet is from the model).
func TextWidth(t Text) float64 { return textMeter.width(t.Text, t.Size, t.Bold) }

// LineHeight returns the line height of text of size pt, mm.
func LineHeight(size float64) float64 { return lineHeight(size) }

// SizeBody is the size of table titles and panel text, pt.
const SizeBody = sizeBody

// ShownRuns names the stations of a detail within w mm (see shownRuns).
func ShownRuns(ss []*planner.Station, w float64, lead, tail string) string {
	b := &builder{m: textMeter}
	return b.shownRuns(ss, w, lead, tail)
}
