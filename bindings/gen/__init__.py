"""The generator of relicore's faces: table (the one table), rustdoc (the one home of the
docs), c_face, fortran_face, python_face, harness (the emitters)."""
