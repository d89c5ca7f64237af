package main

import (
	"fmt"
	"io"
	"os"
	"path/filepath"
	"strings"
	"syscall"
	"testing"
)

// demoEdit writes demo name with each old→new replacement applied (each
// old must occur) to dir and returns its path.
func demoEdit(t *testing.T, dir, name string, repl ...string) string {
	t.Helper()
	data, err := os.ReadFile(demoDir + "/" + name + ".yaml")
	if err != nil {
		t.Fatal(err)
	}
	text := string(data)
	for i := 0; i+1 < len(repl); i += 2 {
		if !strings.Contains(text, repl[i]) {
			t.Fatalf("%s: no %q to replace", name, repl[i])
		}
		text = strings.Replace(text, repl[i], repl[i+1], 1)
	}
	path := filepath.Join(dir, name+".yaml")
	if err := os.WriteFile(path, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	return path
}

// cutBetween returns the replacement pair that removes text from the line
// starting with from up to (not including) the line starting with to.
func cutBetween(t *testing.T, name, from, to string) [2]string {
	t.Helper()
	data, err := os.ReadFile(demoDir + "/" + name + ".yaml")
	if err != nil {
		t.Fatal(err)
	}
	text := string(data)
	a, b := strings.Index(text, from), strings.Index(text, to)
	if a < 0 || b < a {
		t.Fatalf("%s: no %q before %q", name, from, to)
	}
	return [2]string{text[a:b], ""}
}

// TestCheckCrew checks that the gate reports people: a crew position
// inside a zone is exit 3 even when every station passes, a crew position
// past a noise limit is listed, and the plan's warnings are printed.
func TestCheckCrew(t *testing.T) {
	const demo = "hard-wall-exhaust-room"
	arcA := cutBetween(t, demo, "  - name: A ", "  - name: R ")
	high := cutBetween(t, demo, "      - name: ref-high", "  - name: F ")
	dir := t.TempDir()
	// the demo's crew position "door" (5.5 m, 1.1 m) is inside EX-2's
	// velocity zone (bent by buoyancy); only stations R (ref-side) and F
	// remain, both warn
	path := demoEdit(t, dir, demo, arcA[0], arcA[1], high[0], high[1])
	out, errOut, code := arc(t, "check", path)
	if code != exitBlocked {
		t.Errorf("crew in a zone: exit %d, want %d\n%s%s", code, exitBlocked, out, errOut)
	}
	for _, want := range []string{
		"0 blocked",                 // the stations themselves pass
		"door",                      // the crew position in the zone
		"inside the velocity zone",  // and why
		"rig operator",              // past a noise limit (117 dB(A) for 2 h)
		"Warnings",                  // the plan's warnings
		"collector capture blocked", // one of them
		"crew position in a zone",   // the summary names the cause of exit 3
	} {
		if !strings.Contains(out, want) {
			t.Errorf("check output lacks %q:\n%s", want, out)
		}
	}
	if _, _, code := arc(t, "check", path, "--format", "json"); code != exitBlocked {
		t.Errorf("--format json: exit %d, want %d", code, exitBlocked)
	}
	// the crew position moved out of the zone (behind the nozzle, by the
	// rig operator): noise alone is a warning of the gate, exit 0
	path = demoEdit(t, dir, demo, arcA[0], arcA[1], high[0], high[1], "at: [5500, 1100]", "at: [600, 3000]")
	if out, errOut, code := arc(t, "check", path); code != exitOK || !strings.Contains(out, "rig operator") {
		t.Errorf("crew out of the zones: exit %d, want 0 and the crew listed\n%s%s", code, out, errOut)
	}
	// layout warnings reach check's text
	pad := demoEdit(t, dir, "outdoor-static-pad", "noise:\n", "noise:\n  room_absorption: 0.3\n")
	out, errOut, code = arc(t, "check", pad)
	if !strings.Contains(out, "room_absorption") {
		t.Errorf("outdoor pad with a room absorption: exit %d, no warning about it\n%s%s", code, out, errOut)
	}
}

// TestEmptyFileNames checks that an empty file name, for any flag that
// names a file or for the layout argument, is a bad command line (exit 2)
// naming the flag, and that nothing is written.
func TestEmptyFileNames(t *testing.T) {
	dir := t.TempDir()
	layoutPath := copyDemo(t, dir)
	for _, c := range []struct {
		args []string
		flag string
	}{
		{[]string{"check", layoutPath, "--as-built", ""}, "--as-built"},
		{[]string{"check", layoutPath, "--as-built="}, "--as-built"},
		{[]string{"plan", layoutPath, "--pdf", ""}, "--pdf"},
		{[]string{"plan", layoutPath, "--csv", ""}, "--csv"},
		{[]string{"plan", layoutPath, "--json", ""}, "--json"},
		{[]string{"plan", layoutPath, "--geojson", ""}, "--geojson"},
		{[]string{"plan", layoutPath, "--as-built-template", ""}, "--as-built-template"},
		{[]string{"plan", layoutPath, "--pdf", filepath.Join(dir, "x.pdf"), "--csv", ""}, "--csv"},
		{[]string{"plume", "--layout", "", "--point", "P"}, "--layout"},
		{[]string{"noise", "--layout", "", "--point", "P", "--distance", "5m"}, "--layout"},
		{[]string{"air", ""}, "layout"},
		{[]string{"init", ""}, "file name"},
		{[]string{"validate", ""}, "layout"},
		{[]string{"plan", ""}, "layout"},
		{[]string{"check", ""}, "layout"},
	} {
		out, errOut, code := arc(t, c.args...)
		if code != exitUsage || !strings.Contains(errOut, c.flag) || !strings.Contains(errOut, "empty") {
			t.Errorf("%q: exit %d, %q %q; want %d naming %s as empty", c.args, code, out, errOut, exitUsage, c.flag)
		}
	}
	if got := names(t, dir); len(got) != 1 {
		t.Errorf("files after the refused runs: %q, want only the layout", got)
	}
}

// lineOf returns the 1-based line of the first line of path that contains
// s.
func lineOf(t *testing.T, path, s string) int {
	t.Helper()
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	for i, l := range strings.Split(string(data), "\n") {
		if strings.Contains(l, s) {
			return i + 1
		}
	}
	t.Fatalf("%s: no line with %q", path, s)
	return 0
}

// TestSheetScaleValidated checks that validate and plan --pdf treat the
// layout's sheet scale alike, at its line and key: a scale of the other
// family than units.sheet is a contradiction in the file (refused by
// both); a scale that does not fit the paper is a warning of validate and
// the refusal of plan --pdf, both at sheet.scale.
func TestSheetScaleValidated(t *testing.T) {
	const demo = "hard-wall-exhaust-room"
	for _, c := range []struct {
		name   string
		repl   []string
		refuse bool // validate refuses; else warns
		want   string
	}{
		{"feet scale on a metric sheet", []string{`scale: "1:25"`, `scale: "1\" = 20'"`}, true, "feet-and-inches scale"},
		{"metric scale on a feet sheet", []string{"sheet: metric", "sheet: imperial"}, true, "metric scale"},
		{"too large for the paper", []string{`scale: "1:25"`, `scale: "1:1"`}, false, "does not fit"},
		{"paper too small for the scale", []string{"paper: A3", "paper: Letter"}, false, "does not fit"},
	} {
		t.Run(c.name, func(t *testing.T) {
			dir := t.TempDir()
			path := demoEdit(t, dir, demo, c.repl...)
			at := fmt.Sprintf("%s:%d: sheet.scale: ", path, lineOf(t, path, "  scale: "))
			out, errOut, code := arc(t, "validate", path)
			switch {
			case c.refuse && (code != exitError || !strings.Contains(errOut, at) || !strings.Contains(errOut, c.want)):
				t.Errorf("validate: exit %d, %q; want %d and %q… %q", code, errOut, exitError, at, c.want)
			case !c.refuse && (code != exitOK || !strings.Contains(out, "warning: "+at) || !strings.Contains(out, c.want)):
				t.Errorf("validate: exit %d, %q %q; want 0 and a warning %q… %q", code, out, errOut, at, c.want)
			}
			pdf := filepath.Join(dir, "x.pdf")
			_, errOut, code = arc(t, "plan", path, "--pdf", pdf)
			if code != exitError || !strings.Contains(errOut, at) || !strings.Contains(errOut, c.want) {
				t.Errorf("plan --pdf: exit %d, %q; want %d and %q… %q", code, errOut, exitError, at, c.want)
			}
			if _, err := os.Stat(pdf); err == nil {
				t.Errorf("plan --pdf refused but wrote %s", pdf)
			}
		})
	}
}

// TestUnitsOverrideSheet checks that --units works on every unmodified
// demo with --pdf: a layout scale of the other family is replaced by the
// largest scale of the new family that is not larger than it (so that a
// plan that fits still fits), and a note says so.
func TestUnitsOverrideSheet(t *testing.T) {
	for _, d := range demos {
		for _, sys := range []string{"metric", "imperial"} {
			dir := t.TempDir()
			pdf := filepath.Join(dir, "x.pdf")
			out, errOut, code := arc(t, "plan", demoDir+"/"+d+".yaml", "--units", sys, "--pdf", pdf)
			if code != exitOK {
				t.Errorf("%s --units %s --pdf: exit %d, %q", d, sys, code, errOut)
				continue
			}
			if _, err := os.Stat(pdf); err != nil {
				t.Errorf("%s --units %s: no sheet: %v", d, sys, err)
			}
			// the hard-wall demo's 1:25 on a feet-and-inches sheet is
			// 3/8" = 1'-0" (1:32); 1/2" = 1'-0" (1:24) would be larger
			if d == "hard-wall-exhaust-room" && sys == "imperial" && !strings.Contains(out, `sheet.scale: 1:25 is a metric scale; with --units imperial the sheet uses 3/8" = 1'-0" (1:32)`) {
				t.Errorf("%s --units imperial: no note of the scale it uses:\n%s", d, out)
			}
		}
	}
}

// TestCoaxialSecondaryDiameter checks that a secondary diameter not above
// the primary one is a bad command line for noise as for plume, in the
// user's words (the flags as typed), before any work.
func TestCoaxialSecondaryDiameter(t *testing.T) {
	coax := []string{"--nozzle", "coaxial", "--diameter", "1in", "--secondary-diameter", "0.5in", "--npr", "1.5", "--temperature-ratio", "1",
		"--secondary-npr", "1.3", "--secondary-temperature-ratio", "1"}
	for _, args := range [][]string{
		append([]string{"noise", "--distance", "2m"}, coax...),
		append([]string{"plume"}, coax...),
	} {
		_, errOut, code := arc(t, args...)
		if code != exitUsage || !strings.Contains(errOut, "--secondary-diameter 0.5in") || !strings.Contains(errOut, "--diameter 1in") || strings.Contains(errOut, " m,") {
			t.Errorf("%s: exit %d, %q; want %d naming the flags as typed", args[0], code, errOut, exitUsage)
		}
	}
}

// TestSlowJetLevels checks a jet below the ARP 876 tables (Uj/c0 < 0.40):
// noise warns on standard error and in its JSON that the levels are
// extrapolated, plan warns for the point, and an NPR barely above 1 (no
// jet at all) is refused as implausible.
func TestSlowJetLevels(t *testing.T) {
	// NPR 1.01 unheated: Mj = sqrt(5·(1.01^(1/3.5) − 1)) ≈ 0.12, Uj/c0 ≈ 0.12
	// (isentropic relations, DERIVED), below 10^−0.4 ≈ 0.40 (ARP 876 tables,
	// as internal/acoustics states them)
	slow := []string{"noise", "--diameter", "50.8mm", "--npr", "1.01", "--temperature-ratio", "1", "--distance", "5m"}
	_, errOut, code := arc(t, slow...)
	if code != exitOK || !strings.Contains(errOut, "warning: Uj/c0 = 0.12 is outside the ARP 876 tables") || !strings.Contains(errOut, "extrapolated") {
		t.Errorf("noise, slow jet: exit %d, stderr %q; want 0 and a warning", code, errOut)
	}
	out, _, code := arc(t, append(slow, "--format", "json")...)
	if code != exitOK || !strings.Contains(out, `"notes"`) || !strings.Contains(out, "extrapolated") {
		t.Errorf("noise --format json, slow jet: exit %d, no note:\n%s", code, out)
	}
	for _, npr := range []string{"1.0000001", "1.0005"} {
		_, errOut, code := arc(t, "noise", "--diameter", "50.8mm", "--npr", npr, "--temperature-ratio", "1", "--distance", "5m")
		if code != exitUsage || !strings.Contains(errOut, "implausible") {
			t.Errorf("noise --npr %s: exit %d, %q; want %d, implausible", npr, code, errOut, exitUsage)
		}
	}
	dir := t.TempDir()
	path := demoEdit(t, dir, "anechoic-model-jet", "npr: 1.28", "npr: 1.0000001")
	at := fmt.Sprintf("%s:%d: ", path, lineOf(t, path, "npr: 1.0000001"))
	if _, errOut, code := arc(t, "validate", path); code != exitError || !strings.Contains(errOut, at) || !strings.Contains(errOut, "implausible") {
		t.Errorf("validate, NPR 1.0000001: exit %d, %q; want %d at %s", code, errOut, exitError, at)
	}
	path = demoEdit(t, dir, "anechoic-model-jet", "npr: 1.28", "npr: 1.01")
	out, errOut, code = arc(t, "plan", path)
	if code != exitOK || !strings.Contains(out, "is outside the ARP 876 tables") || !strings.Contains(out, "extrapolated") {
		t.Errorf("plan, a slow point: exit %d, no warning\n%s%s", code, out, errOut)
	}
}

// TestPipeWithoutReader checks that plan refuses at once a named pipe that
// nothing reads (it waited forever) and writes none of the run's outputs,
// and writes through a pipe that is read.
func TestPipeWithoutReader(t *testing.T) {
	dir := t.TempDir()
	layoutPath := copyDemo(t, dir)
	fifo := filepath.Join(dir, "ff")
	if err := syscall.Mkfifo(fifo, 0o600); err != nil {
		t.Fatal(err)
	}
	pdf := filepath.Join(dir, "ok.pdf")
	_, errOut, code := arc(t, "plan", layoutPath, "--pdf", pdf, "--as-built-template", fifo)
	if code != exitUsage || !strings.Contains(errOut, "--as-built-template "+fifo+" is a pipe that nothing reads") {
		t.Errorf("pipe without a reader: exit %d, %q; want %d and the flag", code, errOut, exitUsage)
	}
	if _, err := os.Stat(pdf); err == nil {
		t.Errorf("the run failed but wrote %s", pdf)
	}
	// init to the same pipe: the same refusal, exit 2
	if _, errOut, code := arc(t, "init", fifo); code != exitUsage || !strings.Contains(errOut, "is a pipe that nothing reads") {
		t.Errorf("init to a pipe without a reader: exit %d, %q; want %d", code, errOut, exitUsage)
	}
	// with a reader (opened first, without waiting; the template fits the
	// pipe's buffer) the template goes through
	r, err := os.OpenFile(fifo, os.O_RDONLY|syscall.O_NONBLOCK, 0)
	if err != nil {
		t.Fatal(err)
	}
	defer r.Close()
	if _, errOut, code := arc(t, "plan", layoutPath, "--as-built-template", fifo); code != exitOK {
		t.Fatalf("pipe with a reader: exit %d, %q", code, errOut)
	}
	if b, err := io.ReadAll(r); err != nil || !strings.HasPrefix(string(b), "id,") {
		t.Errorf("pipe with a reader: got %.40q, %v", b, err)
	}
}

// TestLayoutEdgeValues checks values at and past the edges of what a
// layout accepts: the ambient range is inclusive alike in every unit, a hex
// float is not a number a user writes, a crew time has a floor, contours
// repeat within 0.1 dB, and a crew position inside an obstacle is flagged.
func TestLayoutEdgeValues(t *testing.T) {
	const demo = "hard-wall-exhaust-room"
	for _, c := range []struct {
		name string
		repl []string
		ok   bool   // validate exits 0
		want string // in the output (errors or warnings), with the line of the key
		key  string // a text on the line the message names
	}{
		// −60 °C is 213.15 K (the bound, inclusive in both units)
		{"−60 C", []string{"temperature: 21 C", "temperature: -60 C"}, true, "", ""},
		{"213.15 K", []string{"temperature: 21 C", "temperature: 213.15 K"}, true, "", ""},
		{"−76 F", []string{"temperature: 21 C", "temperature: -76 F"}, true, "", ""},
		{"+60 C", []string{"temperature: 21 C", "temperature: 60 C", "temperature: 45 C", "temperature: 80 C"}, true, "", ""},
		{"333.15 K", []string{"temperature: 21 C", "temperature: 333.15 K", "temperature: 45 C", "temperature: 80 C"}, true, "", ""},
		{"−60.1 C", []string{"temperature: 21 C", "temperature: -60.1 C"}, false, "implausible", "temperature: -60.1 C"},
		{"213.1 K", []string{"temperature: 21 C", "temperature: 213.1 K"}, false, "implausible", "temperature: 213.1 K"},
		{"hex float NPR", []string{"npr: 1.08", "npr: 0x1.2p0"}, false, "0x1.2p0", "npr: 0x1.2p0"},
		{"hex float hours", []string{"hours: 2 h", "hours: 0x1p1 h"}, false, "0x1p1", "hours: 0x1p1 h"},
		{"hex float far-field ratio", []string{"far_field_ratio: 15", "far_field_ratio: 0xF"}, false, "0xF", "far_field_ratio: 0xF"},
		{"1e-300 h", []string{"hours: 2 h", "hours: 1e-300 h"}, false, "at least 1 s", "hours: 1e-300 h"},
		{"1 s is the least", []string{"hours: 2 h", "hours: 0.0002778 h"}, true, "", ""},
		{"contours 0.1 dB apart at most", []string{"reverberation_time: 1.8 s", "reverberation_time: 1.8 s\n  contours: [100 dB(A), 100.0000001 dB(A)]"}, false, "already in the list", "contours:"},
		{"contours 0.2 dB apart", []string{"reverberation_time: 1.8 s", "reverberation_time: 1.8 s\n  contours: [100 dB(A), 100.2 dB(A)]"}, true, "", ""},
		{"crew inside an obstacle", []string{"at: [600, 3500]", "at: [800, 2000]"}, true, "inside the obstacle burner rig", "at: [800, 2000]"},
	} {
		t.Run(c.name, func(t *testing.T) {
			path := demoEdit(t, t.TempDir(), demo, c.repl...)
			out, errOut, code := arc(t, "validate", path)
			if (code == exitOK) != c.ok {
				t.Errorf("exit %d, want ok %v\n%s%s", code, c.ok, out, errOut)
			}
			if c.want == "" {
				return
			}
			at := fmt.Sprintf("%s:%d: ", path, lineOf(t, path, c.key))
			if all := out + errOut; !strings.Contains(all, at) || !strings.Contains(all, c.want) {
				t.Errorf("want %q… %q, got\n%s%s", at, c.want, out, errOut)
			}
		})
	}
}

// TestHexFloatFlag checks that a number flag takes decimals only, as the
// layout does: strconv reads 0x1p1 as 2.
func TestHexFloatFlag(t *testing.T) {
	_, errOut, code := arc(t, "noise", "--npr", "0x1p1", "--diameter", "50mm", "--temperature-ratio", "1", "--distance", "3m")
	if code != exitUsage || !strings.Contains(errOut, "--npr") || !strings.Contains(errOut, "0x1p1") {
		t.Errorf("--npr 0x1p1: exit %d, %q; want %d naming it", code, errOut, exitUsage)
	}
}
