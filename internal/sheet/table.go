package sheet

import (
	"math"
	"strings"
)

// tableSpec is a table before layout: headings and cell texts.
type tableSpec struct {
	name  string
	title string
	heads []string
	right []bool // right-aligned columns
	flex  []bool // columns that take the width left over and wrap
	rows  [][]string
	maxW  float64 // largest width, mm; 0: the flow's width
}

// minLaneRows is the least number of rows a lane of a narrow table holds
// when the table could end in fewer lanes.
const minLaneRows = 10

// Table padding, mm.
const (
	cellPadX = 1.0
	cellPadY = 0.6
)

// sizeTableMin is the smallest size a table shrinks to, pt, to fit the
// frame's width before its longest words would overflow their columns
// (about 1.8 mm capitals, a size that still reads on a print: common
// practice for the notes of drawings is no smaller).
const sizeTableMin = 5.0

// layoutColumns returns the column widths of t within w (mm) at size pt,
// and whether every column holds its longest word: each column as wide as
// its widest cell (headings may wrap at spaces), a flexible column at
// least 30 mm where the width allows, the flexible columns sharing what is
// left in proportion to what they lack; when that is too wide, each column
// gives up width in proportion to what it may give, down to its longest
// word, and its cells wrap. When even the longest words do not fit, the
// columns shrink in proportion and it reports false.
func (b *builder) layoutColumns(t *tableSpec, w, size float64) ([]float64, bool) {
	n := len(t.heads)
	nat := make([]float64, n)  // natural width (longest cell on one line)
	word := make([]float64, n) // longest heading word
	for i, h := range t.heads {
		for _, wd := range splitWords(h) {
			word[i] = math.Max(word[i], b.m.width(wd, size, true))
		}
	}
	for _, r := range t.rows {
		for i, c := range r {
			nat[i] = math.Max(nat[i], b.m.width(c, size, false))
		}
	}
	// 0.3 mm slack keeps a word exactly as wide as its column on one line
	const pad = 2*cellPadX + 0.3
	hi := make([]float64, n)   // one line
	want := make([]float64, n) // before the fixed columns wrap
	sumWant := 0.0
	for i := range hi {
		hi[i] = math.Max(nat[i], word[i]) + pad
		want[i] = hi[i]
		if t.flex[i] {
			want[i] = math.Min(hi[i], math.Max(word[i]+pad, 30))
		}
		sumWant += want[i]
	}
	ws := make([]float64, n)
	if sumWant <= w {
		copy(ws, want)
		lack := 0.0
		for i := range ws {
			if t.flex[i] {
				lack += hi[i] - want[i]
			}
		}
		if extra := w - sumWant; lack > 0 {
			f := math.Min(1, extra/lack)
			for i := range ws {
				if t.flex[i] {
					ws[i] += f * (hi[i] - want[i])
				}
			}
		}
		return ws, true
	}
	// the narrowest each column goes: its longest word
	lo := make([]float64, n)
	sumLo := 0.0
	for i := range lo {
		lw := word[i]
		for _, r := range t.rows {
			if i < len(r) {
				for _, wd := range splitWords(r[i]) {
					lw = math.Max(lw, b.m.width(wd, size, false))
				}
			}
		}
		lo[i] = math.Min(lw+pad, want[i])
		sumLo += lo[i]
	}
	if sumLo > w {
		for i := range ws {
			ws[i] = lo[i] * w / sumLo
		}
		return ws, false
	}
	f := (w - sumLo) / (sumWant - sumLo)
	for i := range ws {
		ws[i] = lo[i] + f*(want[i]-lo[i])
	}
	return ws, true
}

// splitWords splits s at spaces.
func splitWords(s string) []string {
	var out []string
	start := -1
	for i, r := range s {
		if r == ' ' || r == '\n' {
			if start >= 0 {
				out = append(out, s[start:i])
				start = -1
			}
		} else if start < 0 {
			start = i
		}
	}
	if start >= 0 {
		out = append(out, s[start:])
	}
	return out
}

// table lays t out at the flow's width and places it, splitting it
// between rows onto as many sheets as it needs; each part after the first
// repeats the heading, its title marked continued. A table narrow enough to
// stand twice across the sheet runs on in lanes side by side under its
// title (each lane with the heading) when it does not end in the first, or
// is long, its last lanes balanced.
func (f *flow) table(t tableSpec) {
	f.placeTable(f.b.layTable(t, f.area.W))
}

// laidTable is a table with its columns sized and its cells wrapped.
type laidTable struct {
	t     tableSpec
	cols  []Column
	rows  []Row
	headH float64 // heading row, mm
	tw    float64 // width, mm
	size  float64 // text size, pt
}

// layTable sizes the columns of t within w (or its own largest width) and
// wraps its cells.
func (b *builder) layTable(t tableSpec, w float64) *laidTable {
	if t.maxW > 0 {
		w = math.Min(w, t.maxW)
	}
	for i := range t.heads {
		t.heads[i] = clean(t.heads[i])
	}
	for _, r := range t.rows {
		for i := range r {
			r[i] = clean(r[i])
		}
	}
	// a table whose longest words do not fit the width at the usual size
	// shrinks, down to the least legible size
	sz := sizeTable
	ws, ok := b.layoutColumns(&t, w, sz)
	for !ok && sz > sizeTableMin {
		sz = math.Max(sizeTableMin, sz-0.5)
		ws, ok = b.layoutColumns(&t, w, sz)
	}
	lh := lineHeight(sz)
	cols := make([]Column, len(ws))
	headLines := 1
	tw := 0.0
	for i, h := range t.heads {
		cols[i] = Column{Heading: b.m.wrap(h, ws[i]-2*cellPadX, sz, true), W: ws[i], Right: t.right[i]}
		headLines = max(headLines, len(cols[i].Heading))
		tw += ws[i]
	}
	headH := float64(headLines)*lh + 2*cellPadY
	rows := make([]Row, len(t.rows))
	for ri, r := range t.rows {
		cells := make([][]string, len(r))
		n := 1
		for i, c := range r {
			cells[i] = b.m.wrap(c, ws[i]-2*cellPadX, sz, false)
			n = max(n, len(cells[i]))
		}
		rows[ri] = Row{Cells: cells, H: float64(n)*lh + 2*cellPadY}
	}
	return &laidTable{t: t, cols: cols, rows: rows, headH: headH, tw: tw, size: sz}
}

// placeTable places lt on the flow (see table).
func (f *flow) placeTable(lt *laidTable) {
	b := f.b
	t, cols, rows, headH, tw := lt.t, lt.cols, lt.rows, lt.headH, lt.tw
	sz := lt.size
	lh := lineHeight(sz)
	lanes := max(1, int((f.area.W+laneGap)/(tw+laneGap)))
	title := func(s string) ([]string, float64) {
		tl := b.m.wrap(s, f.area.W, sizeBody, true)
		return tl, float64(len(tl))*lineHeight(sizeBody) + 1
	}
	fullTitle, fullH := title(clean(t.title))
	contTitle, contH := title(clean(shortTitle(t.title)) + " (continued)")
	laneX := func(k int) float64 { return f.area.X + float64(k)*(tw+laneGap) }
	// fill lays rows from top into the lanes, each down to limit mm below
	// top at most, and returns how many rows go in each lane
	fill := func(rows []Row, top, limit float64, first bool, nl int) []int {
		var counts []int
		i := 0
		// the title spans the lanes; the lanes after the first carry the
		// heading alone
		y0 := top + contH
		if first {
			y0 = top + fullH
		}
		for k := 0; k < nl && i < len(rows); k++ {
			y := y0 + headH
			bottom := math.Min(f.bottomFor(laneX(k), laneX(k)+tw), top+limit)
			n := 0
			for i < len(rows) && y+rows[i].H <= bottom {
				y += rows[i].H
				i++
				n++
			}
			if n == 0 {
				break
			}
			counts = append(counts, n)
		}
		return counts
	}
	sum := func(c []int) int {
		n := 0
		for _, v := range c {
			n += v
		}
		return n
	}
	first := true
	for len(rows) > 0 || first {
		// start a part only where its heading and a few rows fit (one row
		// for a part that goes on)
		need, keep := contH+headH, 1
		if first {
			need, keep = fullH+headH, 3
		}
		for i := 0; i < min(keep, len(rows)); i++ {
			need += rows[i].H
		}
		// the title spans the sheet and keeps above the title block; the
		// rows of a table narrower than the space beside the title block
		// go down beside it
		titleH := contH
		if first {
			titleH = fullH
		}
		for f.page == nil || (!f.atTop() && (f.room() < titleH || f.bottomFor(laneX(0), laneX(0)+tw)-f.y < need)) {
			f.newPage()
		}
		top := f.y
		nolimit := f.b.frame.Bottom() - top
		counts := fill(rows, top, nolimit, first, 1)
		if nl := min(lanes, len(rows)/minLaneRows); nl > 1 || (lanes > 1 && sum(counts) < len(rows)) {
			nl = max(nl, min(lanes, 2))
			if sum(counts) < len(rows) {
				nl = lanes
			}
			counts = fill(rows, top, nolimit, first, nl)
			if sum(counts) == len(rows) {
				// the table ends in these lanes: balance them
				lo, hi := 0.0, nolimit
				for hi-lo > 0.2 {
					mid := (lo + hi) / 2
					if sum(fill(rows, top, mid, first, nl)) == len(rows) {
						hi = mid
					} else {
						lo = mid
					}
				}
				counts = fill(rows, top, hi, first, nl)
			}
		}
		if len(counts) == 0 && len(rows) > 0 {
			if !f.atTop() {
				f.newPage()
				continue
			}
			counts = []int{1} // a row taller than a sheet: print it anyway
		}
		bottom := top
		for k, n := range counts {
			tl, th := contTitle, contH
			if first {
				tl, th = fullTitle, fullH
			}
			y := top
			if k > 0 {
				y, tl, th = top+th, nil, 0
			}
			part := Table{
				Name: t.name, Title: strings.Join(tl, "\n"), X: laneX(k), Y: y, Size: sz, Line: lh,
				TitleH: th, HeadH: headH, Columns: cols, Continued: !(k == 0 && first), Rows: rows[:n],
			}
			rows = rows[n:]
			f.page.Tables = append(f.page.Tables, part)
			bottom = math.Max(bottom, y+part.H())
		}
		if len(counts) == 0 {
			// an empty table: its title and heading alone
			f.page.Tables = append(f.page.Tables, Table{Name: t.name, Title: strings.Join(fullTitle, "\n"), X: f.area.X, Y: top, Size: sz, Line: lh,
				TitleH: fullH, HeadH: headH, Columns: cols})
			bottom = top + fullH + headH
		}
		f.y = bottom + 2
		first = false
		if len(rows) > 0 {
			f.newPage()
		}
	}
}
