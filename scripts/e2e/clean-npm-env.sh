# Sourced by scripts that run npm themselves from inside an npm script (`npm test`): the outer
# npm exports npm_config_* and npm_* variables (a user agent naming the system Node, nodedir,
# prefix, …) that would steer an inner npm, and the install checks of what it installs, to the
# system Node. Unsets every such variable so the inner npm starts from a clean environment.
while IFS= read -r name; do unset "$name"; done < <(env | sed -n 's/^\([Nn][Pp][Mm]_[A-Za-z0-9_]*\)=.*/\1/p')
unset INIT_CWD
