package sheet

import (
	"bytes"
	"encoding/json"
	"fmt"
	"sort"
	"strings"
)

// Dump returns the model as JSON text for golden tests: object keys
// sorted, every number rounded to 0.001 (mm, pt or m), and every object or
// array that fits in 160 characters on one line, so that the text is short,
// reads line by line in a diff, and is the same on every platform.
func (m *Model) Dump() ([]byte, error) {
	raw, err := json.Marshal(m)
	if err != nil {
		return nil, fmt.Errorf("sheet: dump: %w", err)
	}
	dec := json.NewDecoder(bytes.NewReader(raw))
	dec.UseNumber()
	var v any
	if err := dec.Decode(&v); err != nil {
		return nil, fmt.Errorf("sheet: dump: %w", err)
	}
	var b strings.Builder
	if err := writeJSON(&b, v, ""); err != nil {
		return nil, fmt.Errorf("sheet: dump: %w", err)
	}
	b.WriteByte('\n')
	return []byte(b.String()), nil
}

// dumpLine is the longest object or array written on one line.
const dumpLine = 160

// compact returns v as compact JSON with sorted keys and rounded numbers.
func compact(v any) (string, error) {
	var b strings.Builder
	switch x := v.(type) {
	case map[string]any:
		b.WriteByte('{')
		for i, k := range sortedKeys(x) {
			if i > 0 {
				b.WriteByte(',')
			}
			ks, _ := json.Marshal(k)
			b.Write(ks)
			b.WriteByte(':')
			s, err := compact(x[k])
			if err != nil {
				return "", err
			}
			b.WriteString(s)
		}
		b.WriteByte('}')
	case []any:
		b.WriteByte('[')
		for i, e := range x {
			if i > 0 {
				b.WriteByte(',')
			}
			s, err := compact(e)
			if err != nil {
				return "", err
			}
			b.WriteString(s)
		}
		b.WriteByte(']')
	case json.Number:
		f, err := x.Float64()
		if err != nil {
			return "", err
		}
		b.WriteString(num3(f))
	default:
		s, err := json.Marshal(x)
		if err != nil {
			return "", err
		}
		b.Write(s)
	}
	return b.String(), nil
}

// writeJSON writes v indented, keeping short objects and arrays on one line.
func writeJSON(b *strings.Builder, v any, ind string) error {
	s, err := compact(v)
	if err != nil {
		return err
	}
	if len(s)+len(ind) <= dumpLine {
		b.WriteString(s)
		return nil
	}
	in := ind + " "
	switch x := v.(type) {
	case map[string]any:
		b.WriteString("{\n")
		for i, k := range sortedKeys(x) {
			ks, _ := json.Marshal(k)
			b.WriteString(in)
			b.Write(ks)
			b.WriteString(": ")
			if err := writeJSON(b, x[k], in); err != nil {
				return err
			}
			if i < len(x)-1 {
				b.WriteByte(',')
			}
			b.WriteByte('\n')
		}
		b.WriteString(ind + "}")
	case []any:
		b.WriteString("[\n")
		for i, e := range x {
			b.WriteString(in)
			if err := writeJSON(b, e, in); err != nil {
				return err
			}
			if i < len(x)-1 {
				b.WriteByte(',')
			}
			b.WriteByte('\n')
		}
		b.WriteString(ind + "]")
	default:
		b.WriteString(s)
	}
	return nil
}

func sortedKeys(m map[string]any) []string {
	ks := make([]string, 0, len(m))
	for k := range m {
		ks = append(ks, k)
	}
	sort.Strings(ks)
	return ks
}
