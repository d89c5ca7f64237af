package sheet

import (
	"fmt"
	"math"
	"strings"
)

// scaleStrip draws the scale bar and the plan's caption under the plan view.
func (b *builder) scaleStrip(pg *Page, vf Rect) {
	bar := scaleBarFor(b.model.Scale, b.req.Units, math.Min(100, vf.W*0.33))
	bar.X, bar.Y = vf.X+3, vf.Bottom()+3.5
	const h = 1.8
	seg := bar.LengthMM / float64(bar.Divisions)
	for i := 0; i < bar.Divisions; i++ {
		r := Rect{bar.X + float64(i)*seg, bar.Y, seg, h}
		s := StyleBox
		if i%2 == 0 {
			s = StyleScaleFill
		}
		pg.Shapes = append(pg.Shapes, rectShape(s, r))
	}
	sz := sizeSmall
	for i, t := range bar.Ticks {
		x := bar.X + float64(i)*seg
		if i == len(bar.Ticks)-1 {
			t += " " + unitSym(b.req.Units)
		}
		w := b.m.width(t, sz, false)
		if i == len(bar.Ticks)-1 {
			w = b.m.width(bar.Ticks[i], sz, false)
		}
		pg.Texts = append(pg.Texts, b.text(x-w/2, bar.Y+h+capHeight(sz)+1, sz, false, t))
	}
	b.model.ScaleBar = bar
	x := bar.X + bar.LengthMM + 12
	pg.Texts = append(pg.Texts, b.text(x, bar.Y+2.2, 7, true, fmt.Sprintf("PLAN   Scale %s on %s — do not scale a print at another size", ScaleName(b.model.Scale, b.req.Units), b.model.Paper.Name)))
	caption := fmt.Sprintf("Scale bar %s. Grid %s from the datum. %s", bar.Label, trimNum(b.gridStep/unitLen(b.req.Units))+" "+unitSym(b.req.Units), b.drawnWhat())
	for i, l := range b.m.wrap(clean(caption), vf.Right()-x, sizeSmall, false) {
		pg.Texts = append(pg.Texts, Text{X: x, Y: bar.Y + 5.6 + float64(i)*lineHeight(sizeSmall), Size: sizeSmall, Text: l})
	}
}

// column lays out the right-hand column of sheet 1: the cautions, the
// legend, the notes and, when it fits, the label key.
func (b *builder) column(pg *Page, notes []string) {
	col := Rect{b.frame.Right() - b.colW, b.frame.Y, b.colW, b.frame.H - titleH - gapMM}
	y := col.Y + 1.5
	y = b.cautions(pg, Rect{col.X + 1.5, y, col.W - 3, 0}) + gapMM
	y = b.legend(pg, Rect{col.X + 1.5, y, col.W - 3, 0}) + gapMM
	y = b.notesPanel(pg, Rect{col.X + 1.5, y, col.W - 3, 0}, notes) + gapMM
	// the warnings panel needs room for its heading and one line at least
	// (all warnings are printed in full on a later sheet)
	if need := 4 + capHeight(sizeHeading) + 0.8 + 2*lineHeight(sizeSmall); len(b.plan.Warnings) > 0 && col.Bottom()-y >= need {
		y = b.warningsPanel(pg, Rect{col.X + 1.5, y, col.W - 3, col.Bottom() - y}) + gapMM
	}
	if len(b.model.Key) > 0 {
		if h := b.keyHeight(col.W - 3); y+h <= col.Bottom() {
			b.keyPanel(pg, Rect{col.X + 1.5, y, col.W - 3, h})
			b.keyPlaced = true
		}
	}
}

// hazardStatement is the safety panel's first line: the hazard and its
// consequence, which set the panel's level.
const hazardStatement = "HOT, HIGH-VELOCITY JET EXHAUST: can kill or seriously injure. Loud enough to damage hearing."

// signalWord is the signal word of the safety panel. Hot high-velocity
// exhaust could result in death or serious injury if the hazard is not
// avoided: the WARNING level of ANSI Z535.4-2007 §4.14.2, with the safety
// orange panel and the safety alert symbol (READ in a label maker's summary
// of ANSI Z535.4 and ISO 3864-2; not DANGER, which the standard keeps for
// hazards that will, not could, result in death).
const signalWord = "WARNING"

// cautionItems are the safety panel's instructions on sheet 1.
func (b *builder) cautionItems() []string {
	pr := b.pr
	return []string{
		"HOT-EXHAUST AND HIGH-VELOCITY ZONES (hatched): no person, stand or cable inside them, or inside their margins (dotted), while the jet runs.",
		fmt.Sprintf("The zones are predictions of the MEAN flow: turbulent gusts are well above the mean. Drawn: velocity zone where the mean velocity exceeds %s, hot zone where the total temperature exceeds %s, each with a margin of %s. The envelopes use the conservative end of the published scatter.",
			pr.speed(b.lim.Velocity), pr.temp(b.lim.Temperature), pr.length(b.lim.Margin)),
		b.drawnWhat() + " Every station was checked against every operating point.",
		"Bent (rising) and wall-jet zones are drawn and checked too; their scatter is wider than the free jet's: keep well clear of every surface the exhaust strikes.",
		"NOISE: wear hearing protection in and near the cell. Keep out of the cell during runs. The predicted levels and contours are estimates (about ±3 dB at best); hearing protection and exclusion zones follow the facility's procedures, local codes and licensed practice.",
		"Before every run: clearances re-measured, nothing loose in the zones, cables secured outside the zones, people out of the cell, headcount done.",
		"Nozzle, ducting and plume-side hardware stay hot after shutdown.",
		"Follow the facility's safety procedures, local codes and licensed practice; they take precedence over this sheet.",
	}
}

// hotName names the hot zone drawn, with its operating point when that is
// not the governing one.
func (b *builder) hotName() string {
	if b.zs.hotPoint != b.gov.Name {
		return "hot zone of point " + b.zs.hotPoint
	}
	return "hot zone"
}

// drawnWhat says which operating points the drawn zones belong to.
func (b *builder) drawnWhat() string {
	s := fmt.Sprintf("The zones drawn are those of operating point %s, the one with the largest velocity zone", b.gov.Name)
	switch {
	case b.zs.hot == nil:
		return s + "; no operating point has a hot zone."
	case b.zs.hotPoint != b.gov.Name:
		return s + fmt.Sprintf(", and the hot zone of point %s, the largest hot zone.", b.zs.hotPoint)
	}
	return s + "."
}

// cautions draws the safety panel at r (its height grows to fit) and
// returns the y of its bottom: a signal-word band in safety orange with the
// safety alert symbol and the word WARNING in black (ANSI Z535.4 and
// ISO 3864-2 panel colours; black on orange stays legible in grey print),
// the hazard statement, and the instructions.
func (b *builder) cautions(pg *Page, r Rect) float64 {
	const pad = 2.5
	const bandH = 7.5
	sz := sizeBody
	lh := lineHeight(sz)
	pg.Shapes = append(pg.Shapes, rectShape(StyleSignal, Rect{r.X, r.Y, r.W, bandH}))
	// the safety alert symbol: a black triangle with an exclamation mark in
	// the panel's colour
	base := r.Y + bandH - 1.2
	tx := r.X + pad
	tri := []Pt{{tx + 2.8, base - 5}, {tx + 5.6, base}, {tx, base}}
	pg.Shapes = append(pg.Shapes, poly(StyleSolid, tri),
		poly(StyleSignalMark, []Pt{{tx + 2.45, base - 3.5}, {tx + 3.15, base - 3.5}, {tx + 2.95, base - 1.6}, {tx + 2.65, base - 1.6}}),
		circle(StyleSignalMark, Pt{tx + 2.8, base - 0.8}, 0.38))
	pg.Texts = append(pg.Texts, Text{X: tx + 7.5, Y: base, Size: sizeCaution, Bold: true, Text: signalWord})
	y := r.Y + bandH + 0.8
	indent := b.m.width("• ", sz, false)
	for _, l := range b.m.wrap(clean(hazardStatement), r.W-2*pad, sz+0.5, true) {
		y += lineHeight(sz + 0.5)
		pg.Texts = append(pg.Texts, Text{X: r.X + pad, Y: y, Size: sz + 0.5, Bold: true, Text: l})
	}
	y += 0.8
	for i, it := range b.cautionItems() {
		bold := i == 0 || i == 3
		lines := b.m.wrap(clean(it), r.W-2*pad-indent, sz, bold)
		for j, l := range lines {
			y += lh
			if j == 0 {
				pg.Texts = append(pg.Texts, b.text(r.X+pad, y, sz, bold, "•"))
			}
			pg.Texts = append(pg.Texts, Text{X: r.X + pad + indent, Y: y, Size: sz, Bold: bold, Text: l})
		}
		y += 0.6
	}
	bottom := y + pad - 0.5
	pg.Shapes = append(pg.Shapes, rectShape(StyleCaution, Rect{r.X, r.Y, r.W, bottom - r.Y}))
	return bottom
}

// safetyFirst returns the plan's warnings, those about the flow leaving
// the free-jet model (a wall jet where a zone meets a surface or an
// obstacle, a buoyant bend) first, each group in the plan's order.
func (b *builder) safetyFirst() []string {
	var first, rest []string
	for _, w := range b.plan.Warnings {
		l := strings.ToLower(w)
		if strings.Contains(l, "wall jet") || strings.Contains(l, "buoyan") || strings.Contains(l, "strikes") || strings.Contains(l, "reaches the") {
			first = append(first, w)
		} else {
			rest = append(rest, w)
		}
	}
	return append(first, rest...)
}

// warningsPanel prints the plan's warnings at r, the safety ones first,
// as many as fit in r's height, and returns the y of its bottom. Those
// that do not fit are counted; all are printed in full on a later sheet.
func (b *builder) warningsPanel(pg *Page, r Rect) float64 {
	const pad = 2.0
	sz := sizeSmall
	lh := lineHeight(sz)
	y := r.Y + pad + capHeight(sizeHeading)
	head := "WARNINGS FROM THE PLAN"
	if len(b.hazardsDrawn) > 0 {
		head += " (a triangle on the plan marks where)"
	}
	pg.Texts = append(pg.Texts, b.text(r.X+pad, y, sizeHeading, true, head))
	y += 0.8
	ws := b.safetyFirst()
	indent := b.m.width("• ", sz, false)
	for i, w := range ws {
		lines := b.m.wrap(clean(w), r.W-2*pad-indent, sz, false)
		if y+float64(len(lines)+1)*lh+pad > r.Bottom() {
			y += lh
			pg.Texts = append(pg.Texts, Text{X: r.X + pad, Y: y, Size: sz, Bold: true,
				Text: clean(plural(len(ws)-i, "more warning") + ": see PLANNER WARNINGS on a later sheet.")})
			break
		}
		b.warningsShown = i + 1
		for j, l := range lines {
			y += lh
			if j == 0 {
				pg.Texts = append(pg.Texts, b.text(r.X+pad, y, sz, false, "•"))
			}
			pg.Texts = append(pg.Texts, Text{X: r.X + pad + indent, Y: y, Size: sz, Text: l})
		}
		y += 0.4
	}
	bottom := y + pad
	pg.Shapes = append(pg.Shapes, rectShape(StyleCaution, Rect{r.X, r.Y, r.W, bottom - r.Y}))
	return bottom
}

// notesPanel prints the plan's notes at r and returns the y of its bottom.
func (b *builder) notesPanel(pg *Page, r Rect, extra []string) float64 {
	p := b.plan
	notes := []string{
		fmt.Sprintf("Stations: %d ok, %d with a warning, %d blocked (of %d).", p.OK, p.Warn, p.Blocked, len(p.Stations)),
	}
	notes = append(notes, extra...)
	if len(b.model.Key) > 0 {
		notes = append(notes, fmt.Sprintf("%s had no room for their IDs and are numbered: see the label key.", plural(len(b.model.Key), "station")))
	}
	if b.ranges != "" {
		notes = append(notes, "A label such as "+b.ranges+" names a run of neighbouring stations too close to label one by one: count the marks along the array from its first station.")
	}
	if n := len(b.model.Unlabelled); n > 0 {
		notes = append(notes, fmt.Sprintf("Not labelled for lack of room (%s): %s. Their positions are in the station table.",
			plural(n, "station"), idList(b.model.Unlabelled)))
	}
	notes = append(notes, "Set-out table and set-up steps: sheet 2; then the elevation, details and tables.")
	const pad = 2.0
	sz := sizeSmall
	lh := lineHeight(sz)
	y := r.Y + pad + capHeight(sizeHeading)
	pg.Texts = append(pg.Texts, b.text(r.X+pad, y, sizeHeading, true, "NOTES"))
	y += 0.8
	for _, n := range notes {
		for _, l := range b.m.wrap(clean(n), r.W-2*pad, sz, false) {
			y += lh
			pg.Texts = append(pg.Texts, Text{X: r.X + pad, Y: y, Size: sz, Text: l})
		}
		y += 0.4
	}
	bottom := y + pad
	pg.Shapes = append(pg.Shapes, rectShape(StyleBox, Rect{r.X, r.Y, r.W, bottom - r.Y}))
	return bottom
}

// idList prints a list of IDs, shortened after 40.
func idList(ids []string) string {
	if len(ids) <= 40 {
		return strings.Join(ids, ", ")
	}
	return strings.Join(ids[:40], ", ") + fmt.Sprintf(" and %d more", len(ids)-40)
}

// keyLayout returns the entry width and the number of entry columns of the
// label key in width w.
func (b *builder) keyLayout(w float64) (float64, int) {
	ew := 0.0
	for _, k := range b.model.Key {
		ew = math.Max(ew, b.m.width(fmt.Sprintf("%d", k.Number), sizeSmall, true)+b.m.width(k.ID, sizeSmall, false))
	}
	ew += 5
	return ew, max(1, int((w-4)/ew))
}

// keyHeight returns the height of the key panel in width w, mm.
func (b *builder) keyHeight(w float64) float64 {
	_, cols := b.keyLayout(w)
	rows := (len(b.model.Key) + cols - 1) / cols
	return 4 + capHeight(sizeHeading) + 1 + float64(rows)*lineHeight(sizeSmall) + 1.5
}

// keyPanel prints the label key (number → station ID) in r.
func (b *builder) keyPanel(pg *Page, r Rect) {
	ew, cols := b.keyLayout(r.W)
	rows := (len(b.model.Key) + cols - 1) / cols
	y := r.Y + 2 + capHeight(sizeHeading)
	pg.Texts = append(pg.Texts, b.text(r.X+2, y, sizeHeading, true, "LABEL KEY (number on the plan: station ID)"))
	y += 1
	lh := lineHeight(sizeSmall)
	for i, k := range b.model.Key {
		c, row := i/rows, i%rows
		x := r.X + 2 + float64(c)*ew
		yy := y + float64(row+1)*lh
		n := fmt.Sprintf("%d", k.Number)
		pg.Texts = append(pg.Texts, Text{X: x, Y: yy, Size: sizeSmall, Bold: true, Text: n},
			Text{X: x + b.m.width(n, sizeSmall, true) + 1.2, Y: yy, Size: sizeSmall, Text: clean(k.ID)})
	}
	pg.Shapes = append(pg.Shapes, rectShape(StyleBox, r))
}
