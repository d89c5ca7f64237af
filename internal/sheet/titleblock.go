package sheet

import (
	"fmt"
	"strings"
	"unicode/utf8"
)

// titleBlock draws the title block in the bottom-right corner of pg.
func (b *builder) titleBlock(pg *Page, pages int) {
	t := b.req.Title
	r := Rect{b.frame.Right() - b.colW, b.frame.Bottom() - titleH, b.colW, titleH}
	pg.TitleBlock = r
	x0, w := r.X, r.W
	type cell struct {
		caption, value string
		w              float64 // fraction of the width
		sign           bool    // a signature field
	}
	units := "metric: m"
	if !b.pr.metric() {
		units = "feet and inches"
	}
	scale := "plan " + ScaleName(b.model.Scale, b.req.Units)
	if b.model.ElevationScale > 0 {
		scale += ", elevation " + ScaleName(b.model.ElevationScale, b.req.Units)
	}
	rows := []struct {
		h     float64
		cells []cell
	}{
		{10, []cell{{"title", t.Title, 1, false}}},
		{6.5, []cell{{"facility", t.Facility, 0.55, false}, {"test", t.Test, 0.45, false}}},
		{6.5, []cell{{"revision", t.Revision, 0.22, false}, {"issue date", b.model.IssueDate, 0.38, false}, {"sheet", fmt.Sprintf("%d of %d", pg.Number, pages), 0.4, false}}},
		{6.5, []cell{{"scale", scale, 0.5, false}, {"units", units, 0.25, false}, {"paper", b.model.Paper.Name + " landscape", 0.25, false}}},
		{6.5, []cell{{"polar-angle convention", b.pr.convention(), 1, false}}},
		{10, []cell{{"prepared", t.PreparedBy, 1.0 / 3, true}, {"checked", t.CheckedBy, 1.0 / 3, true}, {"approved", t.ApprovedBy, 1.0 / 3, true}}},
		{6, []cell{{"layout file", b.req.Source, 0.6, false}, {"document", "floor layout sheet (arcwright)", 0.4, false}}},
	}
	pg.Shapes = append(pg.Shapes, rectShape(StyleWhite, r), rectShape(StyleFrame, r))
	y := r.Y
	for ri, row := range rows {
		x := x0
		for ci, c := range row.cells {
			cw := c.w * w
			if ci == len(row.cells)-1 {
				cw = x0 + w - x
			}
			if ci > 0 {
				pg.Shapes = append(pg.Shapes, line(StyleBox, Pt{x, y}, Pt{x, y + row.h}))
			}
			pg.Texts = append(pg.Texts, Text{X: x + 1, Y: y + 1.9, Size: 4.2, Color: Grey, Text: c.caption})
			size := 6.5
			if ri == 0 {
				size = 10
			}
			val := clean(c.value)
			if c.sign && strings.TrimSpace(val) == "" {
				pg.Shapes = append(pg.Shapes, line(StyleRule, Pt{x + 2, y + row.h - 1.6}, Pt{x + cw - 2, y + row.h - 1.6}))
				pg.Texts = append(pg.Texts, Text{X: x + 2, Y: y + row.h - 2.2, Size: 4.2, Color: Grey, Text: "sign and date"})
			} else {
				size, val = b.fitText(val, cw-2, size, ri == 0)
				pg.Texts = append(pg.Texts, Text{X: x + 1, Y: y + row.h - 1.3, Size: size, Bold: ri == 0, Text: val})
			}
			x += cw
		}
		y += row.h
		if ri < len(rows)-1 {
			pg.Shapes = append(pg.Shapes, line(StyleBox, Pt{x0, y}, Pt{x0 + w, y}))
		}
	}
}

// fitText shrinks text to fit w (mm), down to 4.5 pt, then shortens it with
// an ellipsis; linear in the length of s.
func (b *builder) fitText(s string, w, size float64, bold bool) (float64, string) {
	for ; size > 4.5 && b.m.width(s, size, bold) > w; size -= 0.5 {
	}
	if b.m.width(s, size, bold) <= w {
		return size, s
	}
	room := w - b.m.width("…", size, bold)
	end, used := 0, 0.0
	for i, r := range s {
		rw := b.m.runeWidth(r, size, bold)
		if i > 0 && used+rw > room {
			break
		}
		used += rw
		end = i + utf8.RuneLen(r)
	}
	return size, s[:end] + "…"
}
