package designfile_test

import (
	"fmt"
	"os"
	"path/filepath"

	"ullage/hazards/designfile"
)

// Load a design file and look at its newest revision.
func ExampleLoad() {
	f, err := designfile.Load(filepath.Join("testdata", "twin_bulb_v2.json"))
	if err != nil {
		fmt.Println(err)
		return
	}
	latest, _ := f.Latest()
	fmt.Println(f.Product.Name)
	fmt.Println("revisions:", f.Labels())
	fmt.Printf("latest: %s of %s, fill %g kg\n", latest.Label, latest.Date, latest.Design.FillMassKg)
	// Output:
	// Twin-bulb desk ornament TB-40
	// revisions: [A B]
	// latest: B of 2024-06-17, fill 0.0055 kg
}

// An older single-design sheet loads as a file with one revision.
func ExampleLoad_singleSheet() {
	f, err := designfile.Load(filepath.Join("testdata", "twin_bulb_v1.json"))
	if err != nil {
		fmt.Println(err)
		return
	}
	r := f.Revisions[0]
	fmt.Println(f.Format, r.Label, r.Date, r.ChangeNote)
	// Output: ullage-design/2 A 2023-11-20 Migrated from a single-design sheet
}

// A broken file is refused with the file, line and field named.
func ExampleLoad_refused() {
	dir, _ := os.MkdirTemp("", "designfile-example")
	defer os.RemoveAll(dir)
	path := filepath.Join(dir, "broken.json")
	os.WriteFile(path, []byte(`{
  "format": "ullage-design/2",
  "product": {"name": "x", "part_number": "", "company": "", "description": "", "colour": "red"},
  "revisions": []
}`), 0o644)
	_, err := designfile.Load(path)
	fmt.Println(filepath.Base(err.Error()))
	// Output: broken.json:3: product.colour: unknown field; the fields here are name, part_number, company, description
}

// Add a revision and save: the previous version is kept as .bak.
func ExampleSave() {
	dir, _ := os.MkdirTemp("", "designfile-example")
	defer os.RemoveAll(dir)
	path := filepath.Join(dir, "ornament.json")

	f, err := designfile.Load(filepath.Join("testdata", "twin_bulb_v2.json"))
	if err != nil {
		fmt.Println(err)
		return
	}
	if err := designfile.Save(path, f); err != nil {
		fmt.Println(err)
		return
	}
	latest, _ := f.Latest()
	next := *latest
	next.Label = f.NextLabel()
	next.Date = "2024-09-02"
	next.ChangeNote = "Fill cut to 5 g."
	next.Design.FillMassKg = 0.005
	if err := f.AddRevision(next); err != nil {
		fmt.Println(err)
		return
	}
	if err := designfile.Save(path, f); err != nil {
		fmt.Println(err)
		return
	}
	saved, _ := designfile.Load(path)
	kept, _ := designfile.Load(path + designfile.BackupSuffix)
	fmt.Println("saved:", saved.Labels())
	fmt.Println("kept: ", kept.Labels())
	// Output:
	// saved: [A B C]
	// kept:  [A B]
}
