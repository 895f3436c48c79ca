;;; skerry-test.el --- Tests of skerry.el  -*- lexical-binding: t; -*-

;; emacs --batch -L editors/emacs -l editors/emacs/test/skerry-test.el \
;;       -f ert-run-tests-batch-and-exit
;; (not -Q: Debian's site start-up puts its elpa-eglot on the load path).  The eglot test needs
;; eglot (built in from Emacs 29) and node for the stub server in editors/test; it is skipped,
;; and ERT says so, when either is missing.

;;; Code:

(require 'ert)
(require 'skerry)

(defconst skerry-test--dir (file-name-directory (or load-file-name buffer-file-name)))
(defconst skerry-test--editors (expand-file-name "../.." skerry-test--dir))
(defconst skerry-test--samples (expand-file-name "vscode/test/samples" skerry-test--editors))

(defmacro skerry-test--with-text (text &rest body)
  "Run BODY in a `skerry-mode' buffer holding TEXT, fontified."
  (declare (indent 1))
  `(with-temp-buffer
     (insert ,text)
     (skerry-mode)
     (font-lock-ensure)
     (goto-char (point-min))
     ,@body))

(defun skerry-test--face-of (text &optional nth)
  "The face at the start of the NTH (default 1st) occurrence of TEXT in the buffer."
  (save-excursion
    (goto-char (point-min))
    (search-forward text nil nil (or nth 1))
    (let ((face (get-text-property (match-beginning 0) 'face)))
      (if (consp face) (car face) face))))

(ert-deftest skerry-test-auto-mode ()
  (let ((buffer (find-file-noselect (expand-file-name "harbour_dawn.skerry" skerry-test--samples))))
    (unwind-protect
        (with-current-buffer buffer
          (should (eq major-mode 'skerry-mode)))
      (kill-buffer buffer))))

(ert-deftest skerry-test-keywords-and-names ()
  (skerry-test--with-text
      "scenario gull\nconst gap_m = 2 m\nvehicle box {\n  speed max 3 m/s\n}\nzone reef polygon (1,1) (2,1) (2,2)\nplan {\n  guard on\n}\n"
    (should (eq (skerry-test--face-of "scenario") 'font-lock-keyword-face))
    (should (eq (skerry-test--face-of "gull") 'font-lock-function-name-face))
    (should (eq (skerry-test--face-of "gap_m") 'font-lock-variable-name-face))
    (should (eq (skerry-test--face-of "box") 'font-lock-type-face))
    (should (eq (skerry-test--face-of "reef") 'font-lock-type-face))
    (should (eq (skerry-test--face-of "zone") 'font-lock-keyword-face))
    (should (eq (skerry-test--face-of "polygon") 'font-lock-keyword-face))
    (should (eq (skerry-test--face-of "speed") 'font-lock-builtin-face))
    (should (eq (skerry-test--face-of "max") 'font-lock-keyword-face))
    (should (eq (skerry-test--face-of "guard") 'font-lock-builtin-face))
    (should (eq (skerry-test--face-of " on") nil))
    (should (eq (skerry-test--face-of "on\n") 'font-lock-constant-face))))

(ert-deftest skerry-test-numbers-and-units ()
  (skerry-test--with-text
      "plan {\n  step 0.5 s\n  horizon 1e5\n  horizon 40 step 2.5e-3 min\n  minimize time + 0.1 fuel\n  solver x gap 0.5%\n}\nconst a = 3kn * 2 m/s^2\n"
    (should (eq (skerry-test--face-of "0.5") 'font-lock-constant-face))
    (should (eq (skerry-test--face-of " s\n") nil))
    (should (eq (skerry-test--face-of "s\n") 'skerry-unit-face))
    (should (eq (skerry-test--face-of "e5") 'font-lock-constant-face))
    (should (eq (skerry-test--face-of "step" 2) 'font-lock-builtin-face))
    (should (eq (skerry-test--face-of "2.5e-3") 'font-lock-constant-face))
    (should (eq (skerry-test--face-of "min") 'skerry-unit-face))
    (should (eq (skerry-test--face-of "fuel") 'font-lock-constant-face))
    (should (eq (skerry-test--face-of "%") 'skerry-unit-face))
    (should (eq (skerry-test--face-of "kn") 'skerry-unit-face))
    (should (eq (skerry-test--face-of "m/s^2") 'skerry-unit-face))))

(ert-deftest skerry-test-comments-and-strings ()
  (skerry-test--with-text
      "include \"sub dir/a.skerry\" // slash\n# hash\n/* block\n   zone hidden box */ zone shown box (0,0) to (1,1)\n"
    (should (eq (skerry-test--face-of "sub dir") 'font-lock-string-face))
    (should (eq (skerry-test--face-of "slash") 'font-lock-comment-face))
    (should (eq (skerry-test--face-of "hash") 'font-lock-comment-face))
    (should (eq (skerry-test--face-of "hidden") 'font-lock-comment-face))
    (should (eq (skerry-test--face-of "shown") 'font-lock-type-face))
    (should (eq (skerry-test--face-of "dir/a") 'font-lock-string-face))))

(ert-deftest skerry-test-comment-region ()
  (skerry-test--with-text "zone a box (0,0) to (1,1)\n"
    (comment-region (point-min) (point-max))
    (should (equal (buffer-string) "// zone a box (0,0) to (1,1)\n"))))

(ert-deftest skerry-test-indentation ()
  (skerry-test--with-text "vehicle v {\nstart (0,\n0) at rest\n    radius 1 m\n      }\nzone z box (0,0) to (1,1)\n"
    (indent-region (point-min) (point-max))
    (should (equal (buffer-string)
                   "vehicle v {\n  start (0,\n    0) at rest\n  radius 1 m\n}\nzone z box (0,0) to (1,1)\n"))))

(ert-deftest skerry-test-server-contact ()
  (let* ((checkout (make-temp-file "skerry-checkout" t))
         (launcher (expand-file-name "bin/skerry" checkout))
         (nested (expand-file-name "examples/deep/" checkout)))
    (unwind-protect
        (progn
          (make-directory (file-name-directory launcher) t)
          (make-directory nested t)
          (with-temp-file launcher (insert "#!/bin/sh\n"))
          (set-file-modes launcher #o755)
          (let ((default-directory nested))
            (should (equal (skerry-server-contact) (list launcher "lsp"))))
          (let ((default-directory (file-name-as-directory temporary-file-directory))
                (skerry-server-command '("skerry" "lsp")))
            (should (equal (skerry-server-contact) '("skerry" "lsp")))))
      (delete-directory checkout t))))

(defun skerry-test--eglot-available ()
  "Load eglot, from the installed packages if it is not built in."
  (or (require 'eglot nil t)
      (progn (package-initialize) (require 'eglot nil t))))

(ert-deftest skerry-test-eglot-talks-to-a-server ()
  (skip-unless (and (skerry-test--eglot-available) (executable-find "node")))
  (should (eq (cdr (assq 'skerry-mode eglot-server-programs)) 'skerry-server-contact))
  (let* ((skerry-server-command
          (list "node" (expand-file-name "test/stub-lsp-server.mjs" skerry-test--editors)))
         (checkout (make-temp-file "skerry-eglot" t))
         (file (expand-file-name "a.skerry" checkout))
         (buffer nil))
    (unwind-protect
        (progn
          (with-temp-file file (insert "zone a box (0, 0) to (1, 1)\n"))
          (setq buffer (find-file-noselect file))
          (with-current-buffer buffer
            (apply #'eglot (eglot--guess-contact))
            (should (eglot-current-server))
            ;; Flymake asks its backends from timers and command hooks, which batch mode
            ;; does not run: ask it here until eglot hands over the server's diagnostics.
            (let ((deadline (+ (float-time) 20)))
              (while (and (null (flymake-diagnostics)) (< (float-time) deadline))
                (accept-process-output nil 0.1)
                (flymake-start)))
            (let ((diagnostics (flymake-diagnostics)))
              (should (= (length diagnostics) 1))
              (should (string-match-p "stub server saw 2 lines"
                                      (flymake-diagnostic-text (car diagnostics)))))))
      (when buffer
        (with-current-buffer buffer
          (when (eglot-current-server)
            (eglot-shutdown (eglot-current-server))))
        (kill-buffer buffer))
      (delete-directory checkout t))))

(provide 'skerry-test)
;;; skerry-test.el ends here
