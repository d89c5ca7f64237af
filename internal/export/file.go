package export

import (
	"bufio"
	"fmt"
	"io"
	"os"
	"path/filepath"
)

// fileMode is the permission of every file WriteFile writes.
const fileMode = 0o644

// WriteFile writes a file atomically. It creates a temporary file in the
// same directory as path (a hidden name starting with "." and the base
// name), calls write with a buffered writer on it, flushes, sets mode 0644,
// syncs and closes it, and renames it over path only if all of that
// succeeded. On any error, including a panic in write, the temporary file is
// removed and path is left as it was (absent, or with its old content).
// After the rename the directory is synced on a best-effort basis.
//
// It returns [ErrNoPath] for an empty path, and otherwise wraps the error of
// write or of the file system with the path (a missing directory gives an
// error wrapping fs.ErrNotExist).
//
// WriteFile panics if write is nil (programmer misuse).
func WriteFile(path string, write func(io.Writer) error) error {
	if write == nil {
		panic("export: WriteFile with a nil write function")
	}
	if path == "" {
		return ErrNoPath
	}
	dir := filepath.Dir(path)
	f, err := os.CreateTemp(dir, "."+filepath.Base(path)+".tmp-*")
	if err != nil {
		return fmt.Errorf("export: writing %s: %w", path, err)
	}
	tmp := f.Name()
	done := false
	defer func() {
		if !done {
			_ = f.Close() // may already be closed; the file is discarded anyway
			_ = os.Remove(tmp)
		}
	}()
	bw := bufio.NewWriter(f)
	if err := write(bw); err != nil {
		return fmt.Errorf("export: writing %s: %w", path, err)
	}
	if err := bw.Flush(); err != nil {
		return fmt.Errorf("export: writing %s: %w", path, err)
	}
	if err := f.Chmod(fileMode); err != nil {
		return fmt.Errorf("export: writing %s: %w", path, err)
	}
	if err := f.Sync(); err != nil {
		return fmt.Errorf("export: writing %s: %w", path, err)
	}
	if err := f.Close(); err != nil {
		return fmt.Errorf("export: writing %s: %w", path, err)
	}
	if err := os.Rename(tmp, path); err != nil {
		return fmt.Errorf("export: writing %s: %w", path, err)
	}
	done = true
	syncDir(dir)
	return nil
}

// syncDir flushes the directory entry of a rename to disk. Errors are
// ignored: the file is complete and in place, and some systems cannot sync
// a directory.
func syncDir(dir string) {
	d, err := os.Open(dir)
	if err != nil {
		return
	}
	_ = d.Sync()
	_ = d.Close()
}
