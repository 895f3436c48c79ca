;;; skerry.el --- Major mode and language server set-up for Skerry scenarios  -*- lexical-binding: t; -*-

;; Version: 0.1.0
;; Package-Requires: ((emacs "27.1"))
;; Keywords: languages

;;; Commentary:

;; `skerry-mode' for `*.skerry' files: comments (`//', `#', `/* */'), font-lock for keywords,
;; numbers with units and declared names, and indentation inside braces.  With eglot (built in
;; from Emacs 29, the `eglot' package before that) the buffer talks to the Skerry language server,
;; `skerry lsp' over stdio: the checkout's `bin/skerry' when the file is inside one, otherwise
;; `skerry-server-command'.
;;
;;   (add-to-list 'load-path "/path/to/editors/emacs")
;;   (require 'skerry)
;;   (add-hook 'skerry-mode-hook #'eglot-ensure)   ; start the server on opening a file

;;; Code:

(require 'rx)

(defgroup skerry nil
  "Skerry trajectory-planning scenarios."
  :group 'languages
  :prefix "skerry-")

(defcustom skerry-indent-offset 2
  "Columns of indentation per level of braces or parentheses."
  :type 'integer)

(defcustom skerry-server-command '("skerry" "lsp")
  "Command of the Skerry language server outside a checkout with bin/skerry."
  :type '(repeat string))

(defface skerry-unit-face
  '((t :inherit font-lock-constant-face :slant italic))
  "Face of units: the `m/s' in `3 m/s', the `%' in `0.5%'.")

(defconst skerry--declarations
  '("scenario" "units" "const" "include" "vehicle" "area" "zone" "target" "waypoint" "plan"))
(defconst skerry--properties
  '("dynamics" "start" "speed" "accel" "radius" "sides" "velocity" "moving" "heading"
    "step" "horizon" "minimize" "clusters" "closed_loop" "solver" "time_limit" "gap"
    "threads" "guard" "pruning" "climb" "altitude" "dimensions" "separation"))
(defconst skerry--words '("box" "polygon" "point" "at" "to" "within" "max"))
(defconst skerry--values '("on" "off" "rest" "time" "fuel" "latest"))

(defconst skerry--keywords
  (append skerry--declarations skerry--properties skerry--words skerry--values)
  "Every keyword of the language; none of them is ever a unit.")

(defconst skerry--name-re (rx (any "A-Za-z_") (* (any "A-Za-z0-9_"))))

(defconst skerry--compound-unit-re
  (rx (+ (any "A-Za-z")) "/" (+ (any "A-Za-z")) (? (or (seq "^" digit) digit)))
  "A compound unit, one token with no spaces: m/s, km/h, m/s^2, m/s2.")

(defconst skerry--number-re
  (rx (or (seq symbol-start (+ digit) (? "." (* digit))) (seq "." (+ digit)))
      (? (any "eE") (? (any "+-")) (+ digit)))
  "A number: 4, 0.5, 2., .5, 1e-3, 4.2E+2.")

(defun skerry--match-unit-after-number (limit)
  "Find the next unit written right after a number, before LIMIT.
Match group 1 is the unit.  As in the lexer, the number is the longest
one there (`1e5' is no `1' with unit `e5'), and a keyword is no unit."
  (let ((unit-re (rx (group-n 2 (regexp skerry--number-re)) (* (any " \t"))
                     (group-n 1 (or "%" (regexp skerry--compound-unit-re)
                                    (regexp skerry--name-re)))))
        found)
    (while (and (not found) (re-search-forward unit-re limit t))
      (let ((number-end (match-end 2)))
        (unless (or (member (match-string 1) skerry--keywords)
                    ;; `syntax-ppss' moves point: keep it after this match.
                    (save-match-data
                      (save-excursion
                        (or (nth 8 (syntax-ppss (match-beginning 0)))
                            (progn (goto-char (match-beginning 2))
                                   (looking-at skerry--number-re)
                                   (/= (match-end 0) number-end))))))
          (setq found t))))
    found))

(defconst skerry--font-lock-keywords
  `((,(rx symbol-start (or "vehicle" "area" "zone" "target" "waypoint") symbol-end
          (+ (any " \t")) (group (regexp skerry--name-re)))
     1 font-lock-type-face)
    (,(rx symbol-start "const" symbol-end (+ (any " \t")) (group (regexp skerry--name-re)))
     1 font-lock-variable-name-face)
    (,(rx symbol-start "scenario" symbol-end (+ (any " \t")) (group (regexp skerry--name-re)))
     1 font-lock-function-name-face)
    (,(regexp-opt skerry--declarations 'symbols) . font-lock-keyword-face)
    (,(regexp-opt skerry--properties 'symbols) . font-lock-builtin-face)
    (,(regexp-opt skerry--words 'symbols) . font-lock-keyword-face)
    (,(regexp-opt skerry--values 'symbols) . font-lock-constant-face)
    (skerry--match-unit-after-number 1 'skerry-unit-face)
    (,(rx symbol-start (regexp skerry--compound-unit-re)) . 'skerry-unit-face)
    (,skerry--number-re . font-lock-constant-face))
  "Font-lock rules of `skerry-mode': declared names, keywords, units and numbers.")

(defvar skerry-mode-syntax-table
  (let ((table (make-syntax-table)))
    ;; `/* */' is comment style a; `//' and `#' are style b, ended by a newline.
    (modify-syntax-entry ?/ ". 124b" table)
    (modify-syntax-entry ?* ". 23" table)
    (modify-syntax-entry ?# "< b" table)
    (modify-syntax-entry ?\n "> b" table)
    (modify-syntax-entry ?_ "_" table)
    (modify-syntax-entry ?% "." table)
    (modify-syntax-entry ?^ "." table)
    (modify-syntax-entry ?\" "\"" table)
    table)
  "Syntax table of `skerry-mode'.")

(defun skerry-indent-line ()
  "Indent the current line by the depth of the braces and parentheses around it."
  (interactive)
  (let* ((depth (save-excursion
                  (beginning-of-line)
                  (let ((state (syntax-ppss)))
                    (if (nth 4 state) nil (car state)))))
         (closing (save-excursion
                    (back-to-indentation)
                    (looking-at-p "[})]"))))
    (when depth
      (let ((offset (- (current-column) (current-indentation))))
        (indent-line-to (* skerry-indent-offset (max 0 (if closing (1- depth) depth))))
        (when (> offset 0)
          (forward-char offset))))))

;;;###autoload
(define-derived-mode skerry-mode prog-mode "Skerry"
  "Major mode for Skerry scenario files."
  :syntax-table skerry-mode-syntax-table
  (setq-local comment-start "// ")
  (setq-local comment-end "")
  (setq-local comment-start-skip (rx (or (seq "/" (+ "/")) (seq "/" (+ "*")) (+ "#")) (* space)))
  (setq-local font-lock-defaults '(skerry--font-lock-keywords))
  (setq-local indent-line-function #'skerry-indent-line)
  (setq-local electric-indent-chars (append "{}()" electric-indent-chars)))

;;;###autoload
(add-to-list 'auto-mode-alist '("\\.skerry\\'" . skerry-mode))

(defun skerry-server-contact (&optional _interactive)
  "The command line of the language server for the current buffer.
The checkout's bin/skerry when the file lies in one,
else `skerry-server-command'."
  (let* ((dir (locate-dominating-file default-directory "bin/skerry"))
         (launcher (and dir (expand-file-name "bin/skerry" dir))))
    (if (and launcher (file-executable-p launcher))
        (list launcher "lsp")
      skerry-server-command)))

(with-eval-after-load 'eglot
  (defvar eglot-server-programs)
  (add-to-list 'eglot-server-programs '(skerry-mode . skerry-server-contact)))

(provide 'skerry)
;;; skerry.el ends here
